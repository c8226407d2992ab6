using ConsistencyHost.Chemistry.Model;
using ConsistencyHost.Chemistry.Perception.Stereo;
using ConsistencyHost.Chemistry.Perception.Symmetry;
using ConsistencyHost.Chemistry.Smiles;
using ConsistencyHost.Chemistry.Tests.Oracle;

namespace ConsistencyHost.Chemistry.Tests.Perception.Symmetry;

/// <summary>The listed-group shortcut must give exactly what the individualisation–refinement search gives: the
/// same orbits and the same diastereotopic CH2 groups, configuration by configuration.</summary>
/// <remarks>The search path is the reference: its constitutional orbits match RDKit's CanonicalRankAtoms on
/// every NCI molecule and its topicity matches RDKit probe substitution (see the Oracle tests).</remarks>
public sealed class ListedGroupEquivalenceTests
{
    [Fact]
    public void Compute_EveryNciConfiguration_ListedGroupMatchesSearch()
    {
        var compared = 0;
        var problems = new List<string>();
        foreach (var (line, smiles) in File.ReadLines(RdkitOracle.Nci5K).Select((s, i) => (i + 1, s.Split(' ', '\t')[0])))
        {
            var molecule = SmilesReader.Read(smiles, SmilesReadOptions.Lenient).Value;
            if (molecule is null || Compare(molecule) is not var (configurations, problem))
            {
                continue;
            }

            compared += configurations;
            if (problem is not null)
            {
                problems.Add($"line {line}: {problem}");
            }
        }

        Assert.True(problems.Count == 0, string.Join('\n', problems.Take(20)));
        Assert.True(compared > 1_000, $"only {compared} configurations compared");
    }

    [Theory]
    [InlineData("CC(O)CC(O)C")] // 2,4-pentanediol, unspecified: meso and chiral forms differ (nmr-methods.md §2.4)
    [InlineData("OC(=O)C(O)C(O)C(O)C(=O)O")] // 2,3,4-trihydroxyglutaric acid: pseudo-asymmetric C3 (common practice)
    [InlineData("CC1CCC(C)CC1")] // 1,4-dimethylcyclohexane: ring cis/trans (common practice)
    [InlineData("CN(C)C(=O)C(C)CC(C)C(=O)N(C)C")] // N,N,N',N'-tetramethyl-2,4-dimethylglutaramide: meso/chiral and slow amide rotation (§2.4, §2.6)
    public void Compute_SymmetricMoleculeWithUnspecifiedElements_ListedGroupMatchesSearch(string smiles)
    {
        var result = Compare(SmilesReader.Read(smiles).Value!);
        Assert.NotNull(result);
        Assert.Null(result.Value.Problem);
        Assert.True(result.Value.Configurations >= 2);
    }

    /// <summary>Null when the group is trivial or too large to list (the shortcut is not taken).</summary>
    private static (int Configurations, string? Problem)? Compare(Molecule molecule)
    {
        var ctx = SymmetryContext.Create(molecule);
        var group = ctx.IsRigid ? null : AutomorphismGroup.TryList(ctx);
        if (group is null)
        {
            return null;
        }

        var (tetra, doubles) = StereoCandidates.Find(ctx);
        var (amides, nitrogens) = AmideRotation.Find(ctx);
        var start = ConfigurationSymmetry.StartCells(ctx, tetra, doubles);
        var count = 0;
        foreach (var (t, d) in StereoEnumeration.Configurations(tetra, doubles))
        {
            count++;
            var problem = Difference(
                    ConfigurationSymmetry.Compute(ctx, t, d, null, start),
                    ConfigurationSymmetry.Compute(ctx, t, d, null, ctx.Cells, group))
                ?? Difference(
                    ConfigurationSymmetry.Compute(ctx, t, [.. d, .. amides], nitrogens),
                    ConfigurationSymmetry.Compute(ctx, t, [.. d, .. amides], nitrogens, group: group));
            if (problem is not null)
            {
                return (count, $"configuration {count}: {problem}");
            }
        }

        return ctx.Search.BudgetExceeded ? (count, "search budget exceeded: no reference") : (count, null);
    }

    private static string? Difference(ConfigurationSymmetry searched, ConfigurationSymmetry listed) =>
        !searched.Orbit.SequenceEqual(listed.Orbit) ? $"orbits {string.Join(',', searched.Orbit)} vs {string.Join(',', listed.Orbit)}"
        : !searched.SplitHydrogens.SequenceEqual(listed.SplitHydrogens) ? "diastereotopic CH2 groups differ"
        : null;
}
