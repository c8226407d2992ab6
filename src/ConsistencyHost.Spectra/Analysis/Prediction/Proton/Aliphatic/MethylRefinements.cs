using ConsistencyHost.Spectra.Analysis.Prediction.Proton.Olefinic;
using ConsistencyHost.Spectra.Analysis.Prediction.Proton.Substituents;

namespace ConsistencyHost.Spectra.Analysis.Prediction.Proton.Aliphatic;

/// <summary>
/// Methyl rows that split by what lies one atom further: CH3–S–Ar (thioanisole 2.48, 2-methylthiopyrimidine 2.6)
/// against CH3–S–alkyl (Me2S 2.10); CH3 on a conjugated C=C (methyl crotonate 1.88, β-methylcinnamates up to 2.6)
/// against an isolated one (1.6–1.8); CH3–C(=O)–N of an N-acylazole (1-acetylindole 2.6) against an acetamide
/// (2.0). Values from memory of Pretsch, Bühlmann &amp; Badertscher 2009.
/// </summary>
internal static class MethylRefinements
{
    /// <summary>The refined (shift, half-width, label) or null to keep the plain row.</summary>
    public static (double Ppm, double HalfWidth, string Label)? For(PredictionContext context, int methyl, int group, Substituent kind) => kind switch
    {
        Substituent.Sulfide when HasAromaticNeighbour(context, group, methyl) => (2.50, 0.2, "CH3–S–Ar"),
        Substituent.Alkenyl when IsConjugatedAlkene(context, group) => (2.00, 0.45, "CH3 on conjugated C=C"),
        Substituent.AmideCarbon when HasAromaticNeighbour(context, group, methyl) => (2.62, 0.2, "CH3–C(=O)–N(azole)"),
        _ => null,
    };

    private static bool HasAromaticNeighbour(PredictionContext context, int atom, int except)
    {
        foreach (var n in context.Molecule.Neighbours(atom))
        {
            if (n != except && context.IsAromatic(n)) return true;
        }

        return false;
    }

    private static bool IsConjugatedAlkene(PredictionContext context, int alkeneCarbon)
    {
        var m = context.Molecule;
        var bonds = m.BondsOf(alkeneCarbon);
        var neighbours = m.Neighbours(alkeneCarbon);
        for (var k = 0; k < bonds.Length; k++)
        {
            if (m.Bonds[bonds[k]].Order == 2 && m.Atoms[neighbours[k]].AtomicNumber == 6)
            {
                return AlkeneSubstituents.Of(context, alkeneCarbon, neighbours[k]).Conjugating > 0;
            }
        }

        return false;
    }
}
