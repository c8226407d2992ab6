using ConsistencyHost.Contract.V1;
using Grpc.Core;

namespace ConsistencyHost.Server.Tests.EndToEnd;

/// <summary>
/// Through the real host on loopback: one unreadable fragment in reported text is a text-unreadable finding
/// beside the other rules' findings (lenient default); strict_text keeps the refusal.
/// </summary>
public sealed class LenientTextTests
{
    private static readonly TimeSpan CallTimeout = TimeSpan.FromSeconds(60);

    // 4-methylacetophenone-style line from the invented samples; "zz" is not a multiplicity, and no solvent is stated.
    private const string Text = "1H NMR (400 MHz) δ 7.86 (d, J = 8.2 Hz, 2H), 7.26 (zz, 2H), 2.57 (s, 3H), 2.41 (s, 3H).";

    private static CheckEntryRequest Request(bool strict) => new()
    {
        EntryId = "AIS-LQ-E013",
        Structure = new Structure { Smiles = "CC(=O)c1ccc(C)cc1" },
        ReportedText = { Text },
        StrictText = strict,
    };

    [Fact]
    public async Task CheckEntry_OneUnreadableFragment_ReturnsItsFindingAndTheOtherRulesFindings()
    {
        await using var host = await RunningHost.StartAsync(["ConsistencyHost.Rules.SpectrumMetadata"]);
        var client = new EntryCheck.EntryCheckClient(host.Channel);

        var response = await client.CheckEntryAsync(Request(strict: false), deadline: DateTime.UtcNow + CallTimeout);

        var unreadable = Assert.Single(response.Findings, f => f.Code == "text-unreadable");
        Assert.Equal("reported-text", unreadable.RuleId);
        Assert.Equal(Severity.Warning, unreadable.Severity);
        Assert.Contains(unreadable.Evidence, e => e.Name == "offset" && e.Value == Text.IndexOf("zz", StringComparison.Ordinal).ToString(System.Globalization.CultureInfo.InvariantCulture));
        Assert.Contains(unreadable.Evidence, e => e.Name == "fragment" && e.Value == "zz");
        Assert.Contains(response.Findings, f => f.RuleId == "spectrum-metadata" && f.Code == "solvent-not-stated");
    }

    [Fact]
    public async Task CheckEntry_StrictText_RefusesTheEntryWithTheFragment()
    {
        await using var host = await RunningHost.StartAsync(["ConsistencyHost.Rules.SpectrumMetadata"]);
        var client = new EntryCheck.EntryCheckClient(host.Channel);

        var error = await Assert.ThrowsAsync<RpcException>(() =>
            client.CheckEntryAsync(Request(strict: true), deadline: DateTime.UtcNow + CallTimeout).ResponseAsync);

        Assert.Equal(StatusCode.InvalidArgument, error.StatusCode);
        Assert.Contains("'zz'", error.Status.Detail, StringComparison.Ordinal);
    }
}
