using ConsistencyHost.Chemistry.Perception.Formula;
using ConsistencyHost.Chemistry.Perception.Symmetry;
using ConsistencyHost.Chemistry.Smiles;

namespace ConsistencyHost.Chemistry.Tests.Oracle;

/// <summary>Over the NCI set, the stereo-aware classes must account for every hydrogen and carbon RDKit counts
/// (rdMolDescriptors.CalcMolFormula), and every range must be ordered.</summary>
public sealed class HydrogenCountOracleTests
{
    [Fact]
    public void Nci5K_HydrogenAndCarbonClasses_CoverRdkitAtomCounts()
    {
        var (rows, error) = RdkitOracle.Rows;
        Assert.True(error is null, error);
        var smiles = File.ReadAllLines(RdkitOracle.Nci5K);
        var problems = new List<string>();
        for (var i = 0; i < rows.Count; i++)
        {
            if (!rows[i].Parsed)
            {
                continue;
            }

            var e = NmrEquivalence.Of(SmilesReader.Read(smiles[i], SmilesReadOptions.Lenient).Value!);
            var rdkit = MolecularFormula.Parse(rows[i].Formula).Formula!;
            var h = e.HydrogenClasses.Sum(c => c.ParentAtoms.Length);
            var c = e.CarbonClasses13C.Sum(x => x.Length);
            if (h != rdkit.Counts.GetValueOrDefault("H") || c != rdkit.Counts.GetValueOrDefault("C")
                || e.Expected1H.Min > e.Expected1H.Max || e.Expected13C.Min > e.Expected13C.Max
                || e.Expected1H.Max < e.HydrogenClasses.Length)
            {
                problems.Add($"{rows[i].Name}: H {h}, C {c}, ranges {e.Expected1H} {e.Expected13C}");
            }
        }

        Assert.True(problems.Count == 0, string.Join('\n', problems.Take(20)));
    }
}
