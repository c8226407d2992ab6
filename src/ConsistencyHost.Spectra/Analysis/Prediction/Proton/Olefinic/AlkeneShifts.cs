using ConsistencyHost.Spectra.Analysis.Prediction.Proton.Substituents;

namespace ConsistencyHost.Spectra.Analysis.Prediction.Proton.Olefinic;

/// <summary>
/// 1H window for the hydrogens on one carbon of a C=C: 5.25 + Z_gem + Z_cis + Z_trans, cis and trans taken from the
/// drawn geometry. Each geometric case the structure leaves open — the two H of a =CH2, an unspecified E/Z — is
/// computed and the window covers both.
/// </summary>
/// <remarks>Half-width 0.25 + 0.05 per substituent: Pascual, Meier &amp; Simon report most estimates within about
/// 0.2 ppm (Helv. Chim. Acta 1966, 49, 164; from memory), with larger errors for crowded and push–pull alkenes.</remarks>
internal static class AlkeneShifts
{
    /// <summary>The window for the hydrogens on <paramref name="carbon"/>, doubly bonded to carbon <paramref name="partner"/>.</summary>
    public static ShiftPrediction Predict(PredictionContext context, int carbon, int partner, string? solvent)
    {
        var sides = AlkeneSubstituents.Of(context, carbon, partner);
        var estimate = new ProtonEstimate().Start(AlkeneIncrements.Base, "ethylene base (Pascual–Meier–Simon)");
        var approximate = 0.0;
        if (sides.Geminal >= 0)
        {
            var (z, label, extra) = Increment(context, carbon, partner, sides.Geminal, sides, Position.Gem);
            estimate.Add(z, label);
            approximate += extra;
        }

        approximate += AddPartnerSide(context, carbon, partner, sides, estimate);
        estimate.Widen(0.25, "increment error");
        if (sides.Count > 0) estimate.Widen(0.05 * sides.Count, sides.Count, "substituents");
        if (approximate > 0) estimate.Widen(approximate, "approximate rows");
        SolventStretch.Apply(estimate, solvent, nearPolarGroup: false);
        return estimate.Finish(ShiftBasis.Increments);
    }

    private static double AddPartnerSide(PredictionContext context, int carbon, int partner, AlkeneSubstituents sides, ProtonEstimate estimate)
    {
        if (sides.First < 0)
        {
            return 0;
        }

        // Case A: the first partner substituent is cis to the H (the second trans); case B the reverse.
        bool? firstCis = sides.Geminal >= 0 && context.Molecule.Atoms[carbon].HydrogenCount == 1
            ? !AlkeneSides.SameSide(context, carbon, partner, sides.Geminal, sides.First)
            : null;
        var a = Case(context, carbon, partner, sides, firstCis: true);
        var b = Case(context, carbon, partner, sides, firstCis: false);
        var (chosen, other) = firstCis == false ? (b, a) : (a, b);
        foreach (var (z, label) in chosen.Terms)
        {
            estimate.Add(z, label);
        }

        if (firstCis is null && Math.Abs(a.Sum - b.Sum) > 0.005)
        {
            var why = context.Molecule.Atoms[carbon].HydrogenCount >= 2 ? "other H of =CH2" : "E/Z not given: other geometry";
            estimate.Cover(estimate.Value - chosen.Sum + other.Sum, why);
        }

        return chosen.Uncertainty;
    }

    private static CaseSum Case(PredictionContext context, int carbon, int partner, AlkeneSubstituents sides, bool firstCis)
    {
        var first = Increment(context, carbon, partner, sides.First, sides, firstCis ? Position.Cis : Position.Trans);
        if (sides.Second < 0)
        {
            return new CaseSum(first.Z, first.Extra, [(first.Z, first.Label)]);
        }

        var second = Increment(context, carbon, partner, sides.Second, sides, firstCis ? Position.Trans : Position.Cis);
        return new CaseSum(first.Z + second.Z, first.Extra + second.Extra, [(first.Z, first.Label), (second.Z, second.Label)]);
    }

    private static (double Z, string Label, double Extra) Increment(PredictionContext context, int carbon, int partner, int atom, AlkeneSubstituents sides, Position position)
    {
        var from = position == Position.Gem ? carbon : partner;
        var kind = SubstituentClassifier.Classify(context, from, atom);
        var row = AlkeneIncrements.Of(kind, AlkeneSubstituents.InRingWith(context, atom, carbon, partner), sides.Conjugated(kind));
        var label = position.ToString().ToLowerInvariant() + "-" + SubstituentLabels.Of(kind);
        if (row is null)
        {
            return (0, label + " (no row)", 0.4);
        }

        var z = position switch { Position.Gem => row.Value.Gem, Position.Cis => row.Value.Cis, _ => row.Value.Trans };
        return (z, label, row.Value.Uncertainty);
    }

    private enum Position
    {
        Gem,
        Cis,
        Trans,
    }

    private sealed record CaseSum(double Sum, double Uncertainty, (double Z, string Label)[] Terms);
}
