using ConsistencyHost.Spectra.Analysis.Prediction.Proton.Substituents;

namespace ConsistencyHost.Spectra.Analysis.Prediction.Proton.Aliphatic;

/// <summary>The sp3 C–H cases where additivity is known to fail and a tabulated value is used instead.</summary>
internal static class AliphaticSpecialCases
{
    /// <summary>A tabulated window, or null when the increments apply.</summary>
    public static ShiftPrediction? Predict(PredictionContext context, int carbon, string? solvent)
    {
        var m = context.Molecule;
        var hydrogens = m.Atoms[carbon].HydrogenCount;
        if (m.Degree(carbon) == 0)
        {
            // Methane 0.22 in CDCl3 (Fulmer et al., Organometallics 2010, 29, 2176, gases table; from memory).
            var methane = new ProtonEstimate().Start(0.22, "CH4 (tabulated)");
            methane.Widen(0.2, "tabulated parent");
            return methane.Finish(ShiftBasis.TabulatedEnvironment);
        }

        return Halomethane(context, carbon, hydrogens, solvent)
            ?? Geminal(context, carbon, hydrogens, solvent)
            ?? MethylOnGroup(context, carbon, hydrogens, solvent);
    }

    private static ShiftPrediction? Halomethane(PredictionContext context, int carbon, int hydrogens, string? solvent)
    {
        var m = context.Molecule;
        var halogen = 0;
        foreach (var n in m.Neighbours(carbon))
        {
            var z = m.Atoms[n].AtomicNumber;
            if (z is not (17 or 35 or 53) || (halogen != 0 && z != halogen))
            {
                return null;
            }

            halogen = z;
        }

        var ppm = HalomethaneShifts.Of(hydrogens, halogen, solvent);
        if (ppm is null)
        {
            return null;
        }

        var estimate = new ProtonEstimate().Start(ppm.Value, (hydrogens == 1 ? "CHX3" : "CH2X2") + " in " + (solvent ?? "CDCl3") + " (Gottlieb-type table)");
        estimate.Widen(0.1, "tabulated parent");
        if (solvent is null) estimate.Stretch(0.05, 1.1, "solvent not given: acidic C–H up to +1.06 in DMSO-d6");
        return estimate.Finish(ShiftBasis.TabulatedEnvironment);
    }

    private static ShiftPrediction? Geminal(PredictionContext context, int carbon, int hydrogens, string? solvent)
    {
        int oxygen = 0, nitrogen = 0, sulfur = 0;
        foreach (var n in context.Molecule.Neighbours(carbon))
        {
            switch (context.Molecule.Atoms[n].AtomicNumber)
            {
                case 8: oxygen++; break;
                case 7: nitrogen++; break;
                case 16: sulfur++; break;
            }
        }

        var range = GeminalHeteroatoms.Of(oxygen, nitrogen, sulfur, hydrogens);
        if (range is null)
        {
            return null;
        }

        var (low, high, likely) = range.Value;
        var estimate = new ProtonEstimate().Start(likely, $"C–H between {oxygen} O, {nitrogen} N, {sulfur} S (acetal-type, tabulated)");
        estimate.Cover(low, "range from");
        estimate.Cover(high, "range to");
        SolventStretch.Apply(estimate, solvent, nearPolarGroup: true);
        return estimate.Finish(ShiftBasis.TabulatedEnvironment);
    }

    private static ShiftPrediction? MethylOnGroup(PredictionContext context, int carbon, int hydrogens, string? solvent)
    {
        var m = context.Molecule;
        if (hydrogens < 3 || m.Degree(carbon) != 1)
        {
            return null;
        }

        var group = m.Neighbours(carbon)[0];
        if (AtomFacts.IsSaturatedCarbon(context, group))
        {
            return null;
        }

        var kind = SubstituentClassifier.Classify(context, carbon, group);
        if (MethylShifts.Of(kind) is not { } row)
        {
            return null;
        }

        var refined = MethylRefinements.For(context, carbon, group, kind);
        var label = refined?.Label ?? "CH3–" + SubstituentLabels.Of(kind);
        var estimate = new ProtonEstimate().Start(refined?.Ppm ?? row.Ppm, label + " (tabulated methyl)");
        estimate.Widen(refined?.HalfWidth ?? row.HalfWidth, "spread of methyl parents");
        SolventStretch.Apply(estimate, solvent, nearPolarGroup: kind is not (Substituent.Aryl or Substituent.Alkenyl or Substituent.Alkynyl or Substituent.Silyl));
        return estimate.Finish(ShiftBasis.TabulatedEnvironment);
    }
}
