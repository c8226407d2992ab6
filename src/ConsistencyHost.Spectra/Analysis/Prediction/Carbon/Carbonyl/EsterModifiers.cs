using ConsistencyHost.Spectra.Analysis.Prediction.Carbon.Core;

namespace ConsistencyHost.Spectra.Analysis.Prediction.Carbon.Carbonyl;

/// <summary>Ester carbonyls: terms for what the ester oxygen carries (the table is for alkyl esters).</summary>
/// <remarks>
/// From memory (Pretsch et al. 2009): phenyl acetate 169.5 (O-aryl −1.6), vinyl acetate 167.7 (O-vinyl −3.3),
/// tert-butyl acetate 170.5 (O-tert-alkyl −0.8), N-hydroxysuccinimide and pentafluorophenyl esters 3–5 lower (O–N −4).
/// </remarks>
internal static class EsterModifiers
{
    /// <summary>Adds the oxygen terms to an ester estimate.</summary>
    public static CarbonEstimate Apply(PredictionContext context, int carbonyl, CarbonEstimate estimate, int oxygen)
    {
        var m = context.Molecule;
        foreach (var x in m.Neighbours(oxygen))
        {
            if (x == carbonyl)
            {
                continue;
            }

            if (context.IsAromatic(x))
            {
                estimate.Add("O-aryl ester", -1.6);
            }
            else if (m.Atoms[x].AtomicNumber == Topology.Nitrogen)
            {
                estimate.Add("O–N ester", -4.0);
                estimate.Widen(2.0);
            }
            else if (Topology.IsSp3Carbon(context, x))
            {
                estimate.AddNonZero("O-tert-alkyl ester", m.Degree(x) >= 4 ? -0.8 : 0);
            }
            else if (m.Atoms[x].AtomicNumber == Topology.Carbon)
            {
                estimate.Add("O-vinyl ester", -3.3);
                estimate.Widen(1.0);
            }
        }

        return estimate;
    }
}
