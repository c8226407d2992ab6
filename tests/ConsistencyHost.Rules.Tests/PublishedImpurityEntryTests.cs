using ConsistencyHost.Sdk.Findings;

namespace ConsistencyHost.Rules.Tests;

/// <summary>
/// Every compound of the published impurity tables, written as a notebook entry from the published numbers
/// (Fixtures/published-impurities.tsv; Gottlieb et al. 1997; Fulmer et al. 2010), passes every built-in rule
/// with no warning and no error: correct data must not be flagged.
/// </summary>
public sealed class PublishedImpurityEntryTests
{
    public static TheoryData<string, string, string, string> Entries()
    {
        var data = new TheoryData<string, string, string, string>();
        foreach (var entry in PublishedEntries.All) data.Add(entry.Name, entry.Solvent, entry.Smiles, entry.Text);
        return data;
    }

    [Theory]
    [MemberData(nameof(Entries))]
    public void Check_PublishedEntry_NoWarningOrError(string name, string solvent, string smiles, string text)
    {
        var report = BuiltInRules.Check(smiles, text).AllRulesRan();

        var serious = report.Findings.Where(f => f.Finding.Severity >= Severity.Warning)
            .Select(f => $"{f.RuleId}/{f.Finding.Code}: {f.Finding.Message}").ToList();
        Assert.True(serious.Count == 0, $"{name} in {solvent}:\n" + string.Join("\n", serious));
    }

    [Fact]
    public void Fixture_CoversBothSolvents() =>
        Assert.True(PublishedEntries.All.Count(e => e.Solvent == "CDCl3") >= 15 && PublishedEntries.All.Count(e => e.Solvent == "DMSO-d6") >= 15);
}
