using System.Text.Json;

namespace ConsistencyHost.Cli.Tests;

/// <summary>
/// check reads reported text leniently by default (the fragment becomes a finding, the other rules still run),
/// --strict refuses with exit 2, and peaks --lenient prints what it read with the fragment on stderr.
/// </summary>
public sealed class LenientTextCommandTests
{
    // No solvent stated and "zz" is not a multiplicity; the Rf and mp clauses are prose to skip.
    private const string Text = "1H NMR (400 MHz) δ 7.86 (d, J = 8.2 Hz, 2H), 7.26 (zz, 2H), 2.57 (s, 3H), 2.41 (s, 3H). Rf 0.32 (hexane); mp 27 °C.";

    [Fact]
    public async Task Check_OneUnreadableFragment_ReportsItBesideTheOtherRulesFindings()
    {
        var (exit, stdout, _) = await CliProcess.RunAsync("check", "--smiles", "CC(=O)c1ccc(C)cc1", "--data", Text, "--format", "json");

        Assert.NotEqual(2, exit);
        using var json = JsonDocument.Parse(stdout);
        var findings = json.RootElement.GetProperty("findings").EnumerateArray().ToList();
        var unreadable = Assert.Single(findings, f => f.GetProperty("code").GetString() == "text-unreadable");
        Assert.Contains("'zz'", unreadable.GetProperty("message").GetString(), StringComparison.Ordinal);
        var skipped = Assert.Single(findings, f => f.GetProperty("code").GetString() == "text-skipped");
        Assert.Contains("Rf at offset", skipped.GetProperty("message").GetString(), StringComparison.Ordinal);
        Assert.Contains("mp at offset", skipped.GetProperty("message").GetString(), StringComparison.Ordinal);
        Assert.Contains(findings, f => f.GetProperty("code").GetString() == "solvent-not-stated");
    }

    [Fact]
    public async Task Check_Strict_RefusesWithExitTwoAndTheFragment()
    {
        var (exit, stdout, stderr) = await CliProcess.RunAsync("check", "--strict", "--smiles", "CC(=O)c1ccc(C)cc1", "--data", Text);

        Assert.Equal(2, exit);
        Assert.Equal("", stdout);
        Assert.Contains("'zz'", stderr, StringComparison.Ordinal);
    }

    [Fact]
    public async Task Peaks_Lenient_PrintsReadSignalsAndTheFragmentOnStderr()
    {
        var (exit, stdout, stderr) = await CliProcess.RunAsync("peaks", "--lenient", "--format", "json", "--data", Text);

        Assert.Equal(0, exit);
        using var json = JsonDocument.Parse(stdout);
        Assert.Equal(4, json.RootElement.GetProperty("spectra")[0].GetProperty("signals").GetArrayLength());
        Assert.Contains("text-unreadable", stderr, StringComparison.Ordinal);
        Assert.Contains("'zz'", stderr, StringComparison.Ordinal);
    }
}
