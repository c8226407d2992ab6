namespace ConsistencyHost.Spectra.Analysis.Prediction.Proton.Substituents;

/// <summary>Classifies a group attached through sulfur (selenium is read as its sulfur analogue).</summary>
internal static class SulfurSubstituents
{
    /// <summary>The kind of the sulfur group <paramref name="atom"/> attached to <paramref name="from"/>.</summary>
    public static Substituent Classify(PredictionContext context, int from, int atom)
    {
        var oxo = AtomFacts.DoubleBondsTo(context, atom, 8);
        if (oxo >= 2) return Substituent.Sulfonyl;
        if (oxo == 1) return Substituent.Sulfinyl;
        var a = context.Molecule.Atoms[atom];
        if (a.Charge != 0) return Substituent.Other;
        if (a.HydrogenCount > 0) return Substituent.Thiol;
        foreach (var n in context.Molecule.Neighbours(atom))
        {
            if (n != from && AtomFacts.IsCarbonylCarbon(context, n))
            {
                return Substituent.ThioEster;
            }
        }

        return Substituent.Sulfide;
    }
}
