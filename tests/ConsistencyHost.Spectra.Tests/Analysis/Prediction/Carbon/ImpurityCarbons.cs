using ConsistencyHost.Chemistry.Smiles;
using ConsistencyHost.Spectra.Analysis.Prediction;
using ConsistencyHost.Spectra.Analysis.Prediction.Carbon;
using ConsistencyHost.Spectra.Model;
using ConsistencyHost.Spectra.Solvents;

namespace ConsistencyHost.Spectra.Tests.Analysis.Prediction.Carbon;

/// <summary>
/// Every 13C cell of the published impurity tables, with its carbon atoms mapped by hand.
/// Source: Gottlieb, Kotlyar, Nudelman, J. Org. Chem. 1997, 62, 7512 (Table 2) and Fulmer et al., Organometallics
/// 2010, 29, 2176 (Table 2), as held in <see cref="ImpurityTable"/> with per-cell provenance.
/// </summary>
/// <remarks>
/// The labels are the table's own. Mapped by hand: n-hexane "CH2" (22.70) is C-2/5 and "C3/4" (31.64) C-3/4;
/// n-pentane "CH2" (22.38) is C-2/4; toluene "H-2/4/6" carries the ortho carbons (129.07), "H-3/5" the meta carbons
/// (128.26), "C4" the para carbon (125.33); DMF "NCH3" and "NCH3′" are the two N-methyls (same window). Water has no
/// carbon. The greases have no single structure: hydrocarbon grease is modelled as an inner CH2 of n-icosane, silicone
/// grease as an inner Si(CH3)2 of a linear siloxane.
/// </remarks>
internal static class ImpurityCarbons
{
    /// <summary>(impurity name, group label) → carbon atom indices in the SMILES used (the table's own unless modelled).</summary>
    private static readonly Dictionary<(string, string), int[]> Map = new()
    {
        [("acetic acid", "CH3")] = [0], [("acetic acid", "C=O")] = [1],
        [("acetone", "CH3")] = [0, 2], [("acetone", "C=O")] = [1],
        [("acetonitrile", "CH3")] = [0], [("acetonitrile", "CN")] = [1],
        [("benzene", "CH")] = [0, 1, 2, 3, 4, 5],
        [("tert-butyl methyl ether", "C(CH3)3")] = [3, 4, 5], [("tert-butyl methyl ether", "OCH3")] = [0],
        [("tert-butyl methyl ether", "C")] = [2],
        [("chloroform", "CH")] = [1],
        [("dichloromethane", "CH2")] = [1],
        [("diethyl ether", "CH3")] = [0, 4], [("diethyl ether", "CH2")] = [1, 3],
        [("DMF", "CHO")] = [3], [("DMF", "NCH3")] = [0], [("DMF", "NCH3'")] = [2],
        [("DMSO", "CH3")] = [0, 2],
        [("1,4-dioxane", "CH2")] = [0, 1, 3, 4],
        [("ethanol", "CH3")] = [0], [("ethanol", "CH2")] = [1],
        [("ethyl acetate", "CH3C(O)")] = [4], [("ethyl acetate", "OCH2")] = [1], [("ethyl acetate", "CH3")] = [0],
        [("ethyl acetate", "C=O")] = [3],
        [("n-hexane", "CH3")] = [0, 5], [("n-hexane", "CH2")] = [1, 4], [("n-hexane", "C3/4")] = [2, 3],
        [("methanol", "CH3")] = [0],
        [("n-pentane", "CH3")] = [0, 4], [("n-pentane", "CH2")] = [1, 3], [("n-pentane", "C3")] = [2],
        [("2-propanol", "CH3")] = [0, 2], [("2-propanol", "CH")] = [1],
        [("pyridine", "H-2/6")] = [2, 4], [("pyridine", "H-3/5")] = [1, 5], [("pyridine", "H-4")] = [0],
        [("tetrahydrofuran", "OCH2")] = [2, 4], [("tetrahydrofuran", "CH2")] = [0, 1],
        [("toluene", "CH3")] = [0], [("toluene", "H-2/4/6")] = [2, 6], [("toluene", "H-3/5")] = [3, 5],
        [("toluene", "C4")] = [4], [("toluene", "C1")] = [1],
        [("triethylamine", "CH3")] = [0, 4, 6], [("triethylamine", "CH2")] = [1, 3, 5],
        [("grease", "CH2")] = [9],
        [("silicone grease", "SiCH3")] = [6, 7],
    };

    /// <summary>Structures for table rows without a SMILES (models, see remarks).</summary>
    private static readonly Dictionary<string, string> Models = new()
    {
        ["grease"] = "CCCCCCCCCCCCCCCCCCCC",
        ["silicone grease"] = "C[Si](C)(C)O[Si](C)(C)O[Si](C)(C)C",
    };

    /// <summary>One tabulated 13C value and the window of one of its carbons.</summary>
    public sealed record Cell(string Impurity, string Label, string Solvent, double Ppm, int Atom, ShiftPrediction Prediction);

    /// <summary>Every 13C cell of the table, once per mapped carbon.</summary>
    public static IEnumerable<Cell> All()
    {
        foreach (var impurity in ImpurityTable.All)
        {
            var smiles = impurity.Smiles ?? Models[impurity.Name];
            var context = PredictionContext.Of(SmilesReader.Read(smiles).Value!);
            foreach (var group in impurity.Groups)
            {
                foreach (var shift in group.Shifts)
                {
                    if (shift.Nucleus != Nucleus.C13)
                    {
                        continue;
                    }

                    if (!Map.TryGetValue((impurity.Name, group.Label), out var atoms))
                    {
                        throw new InvalidOperationException($"No hand mapping for 13C cell {impurity.Name} / {group.Label}.");
                    }

                    foreach (var atom in atoms)
                    {
                        yield return new Cell(impurity.Name, group.Label, shift.Solvent, shift.Ppm, atom,
                            CarbonShifts.Predict(context, atom, shift.Solvent));
                    }
                }
            }
        }
    }
}
