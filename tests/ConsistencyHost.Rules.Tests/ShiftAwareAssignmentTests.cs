namespace ConsistencyHost.Rules.Tests;

/// <summary>
/// The shift-aware assignment on published entries (Fixtures/published-si-entries.tsv, each row naming its
/// article): the classes land where their predicted shifts put them, so the coupling-tree check judges the right
/// class, and seeded one-line-fewer faults on aromatic and vinyl protons are caught.
/// </summary>
public sealed class ShiftAwareAssignmentTests
{
    [Fact]
    public void Check_DiphenylpropeneAsPublished_NoPatternFault()
    {
        // si-089, (E)-1,3-diphenylpropene: two vinyl CH at 6.55 (d) and 6.45 (dt), the CH2 at 3.64 (d). Counts
        // alone also allow the two para CH in the vinyl signals and the vinyl CH in the 2 H doublet.
        var entry = PublishedSiEntries.All.Single(e => e.Id == "si-089");

        var report = BuiltInRules.Check(entry.Smiles, entry.Text).AllRulesRan();

        Assert.DoesNotContain("pattern-too-few-lines", report.Codes("coupling-partners"));
    }

    [Theory]
    // si-009 benzophenone: the meta H (two ortho neighbours, 7.6 Hz) reported as a d.
    [InlineData("si-009", "7.46 ppm (t,", "7.46 ppm (d,")]
    // si-016 2-tert-butylquinoline: H-7 (ortho to H-6 and H-8) reported as a d.
    [InlineData("si-016", "7.66 (t,", "7.66 (d,")]
    // si-028 ethyl (Z)-2-benzamido-3-phenylacrylate: the OCH2 of the ethyl ester reported as a t.
    [InlineData("si-028", "4.33 (q,", "4.33 (t,")]
    public void Check_SeededOneLineFewer_Caught(string id, string replace, string with)
    {
        var entry = PublishedSiEntries.All.Single(e => e.Id == id);
        Assert.Contains(replace, entry.Text, StringComparison.Ordinal);

        var asPublished = BuiltInRules.Check(entry.Smiles, entry.Text).AllRulesRan();
        var seeded = BuiltInRules.Check(entry.Smiles, entry.Text.Replace(replace, with, StringComparison.Ordinal)).AllRulesRan();

        Assert.DoesNotContain("pattern-too-few-lines", asPublished.Codes("coupling-partners"));
        Assert.Contains("pattern-too-few-lines", seeded.Codes("coupling-partners"));
    }
}
