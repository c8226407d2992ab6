namespace ConsistencyHost.Rules.Tests;

/// <summary>
/// Two signals that can only couple to each other but report different J: one partner-j-differs naming both,
/// instead of a j-without-partner on each side. Entries: Fixtures/published-impurities.tsv (Gottlieb, Kotlyar,
/// Nudelman, J. Org. Chem. 1997, 62, 7512; Fulmer et al., Organometallics 2010, 29, 2176), J values seeded.
/// </summary>
public sealed class InferredPairTests
{
    [Fact]
    public void Check_EthylQuartetAndTripletWithDifferentJ_OnePairFindingNamingBoth()
    {
        // The ethyl CH2 couples only to the CH3 and vice versa (the acetyl CH3 is four bonds away); 7.4 and 6.6 Hz
        // both lie in the freely rotating vicinal range, so they can only be one coupling typed twice.
        var entry = PublishedEntries.Get("ethyl acetate", "CDCl3");
        var text = entry.Text.Replace("(q, J = 7 Hz", "(q, J = 7.4 Hz", StringComparison.Ordinal).Replace("(t, J = 7 Hz", "(t, J = 6.6 Hz", StringComparison.Ordinal);

        var report = BuiltInRules.Check(entry.Smiles, text).AllRulesRan();

        var pair = Assert.Single(report.Findings, f => f.Finding.Code == "partner-j-differs");
        Assert.Equal([0, 2], pair.Finding.Peaks.Select(p => p.Signal).Order());
        Assert.DoesNotContain("j-without-partner", report.Codes("coupling-partners"));
    }

    [Fact]
    public void Check_JOutsideTheCouplingTypesRange_StaysUnpartneredOnEachSide()
    {
        // 9 Hz is beyond any freely rotating vicinal coupling, so the two values are not read as one coupling.
        var entry = PublishedEntries.Get("diethyl ether", "CDCl3");
        var text = entry.Text.Replace("1.21 (t, J = 7 Hz, 6H)", "1.21 (t, J = 9 Hz, 6H)", StringComparison.Ordinal);

        var report = BuiltInRules.Check(entry.Smiles, text).AllRulesRan();

        Assert.DoesNotContain("partner-j-differs", report.Codes("coupling-partners"));
        Assert.Contains("j-without-partner", report.Codes("coupling-partners"));
    }
}
