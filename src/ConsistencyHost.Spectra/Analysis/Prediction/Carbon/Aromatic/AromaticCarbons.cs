using ConsistencyHost.Spectra.Analysis.Prediction.Carbon.Core;

namespace ConsistencyHost.Spectra.Analysis.Prediction.Carbon.Aromatic;

/// <summary>
/// Aromatic carbons: the parent ring system's value (benzene 128.5, a tabulated heteroaromatic position, or a wide
/// local rule) plus benzene substituent increments for every substituent on a ring that holds the carbon.
/// </summary>
/// <remarks>
/// Increments pass to six-membered heteroaromatic rings scaled by 0.9, as Paudler and Jovanovic found for pyridine
/// against benzene (Org. Magn. Reson. 1982, 19, 192; abstract read: pyridine 0.89, thiophene 1.35, furan 1.31).
/// Their five-membered-ring ratios hold for some positions only (2-phenylfuran C-2 +11 against +13 on benzene,
/// 2-methylfuran C-3 −3.7 against +0.7; from memory), so five-membered rings take the benzene values unscaled with
/// twice the proportional error. A heteroatom substituent on a carbon next to ring nitrogen shifts that carbon about
/// half as much as on benzene (2-methoxypyridine C-2 164.0 against pyridine 149.9: +14 for +31.4; from memory).
/// </remarks>
internal static class AromaticCarbons
{
    private const double JcfDoubletLines = 1.3;

    /// <summary>The window of aromatic carbon <paramref name="carbon"/>.</summary>
    public static ShiftPrediction Predict(PredictionContext context, int carbon)
    {
        var facts = AromaticFacts.Of(context);
        var estimate = Parent(context, carbon, facts, out var basis);
        var count = AromaticSubstituentSum.Add(context, carbon, estimate);
        RingNitrogenSubstituents.Widen(context, carbon, estimate);
        if (Topology.CountNeighbours(context.Molecule, carbon, 9) > 0)
        {
            estimate.Widen("C–F doublet lines", JcfDoubletLines);
        }

        return estimate.Build(basis, count == 0 ? "parent ring value" : "ring substituents (increment error)", count);
    }

    private static CarbonEstimate Parent(PredictionContext context, int carbon, AromaticFacts facts, out ShiftBasis basis)
    {
        if (facts.Template[carbon] is { } template)
        {
            var t = facts.TemplateAtom[carbon];
            var estimate = new CarbonEstimate().Base(template.Labels[t], template.Ppm[t]);
            estimate.Widen(BaseHalfWidth(template.Kind) + template.Spread);
            var averaged = template.Averaged[t];
            if (facts.TautomericNH[carbon] && !double.IsNaN(averaged))
            {
                // Fast N–H exchange averages the positions: the window reaches both the drawn and the averaged value.
                var shift = (averaged - template.Ppm[t]) / 2;
                estimate.AddNonZero("N–H tautomer average", shift);
                estimate.Widen("N–H tautomerism", Math.Abs(shift) + 1.0);
            }

            basis = template.Kind == RingKind.Benzenoid && template.Atoms.Length == 6 ? ShiftBasis.Increments : ShiftBasis.TabulatedEnvironment;
            return estimate;
        }

        basis = ShiftBasis.EnvironmentFallback;
        return LocalAromaticRules.Estimate(context, carbon).ToEstimate();
    }

    private static double BaseHalfWidth(RingKind kind) => kind switch
    {
        RingKind.Benzenoid => 1.5,
        RingKind.Azine => 2.0,
        RingKind.FiveMembered => 2.5,
        _ => 3.0,
    };
}
