using ConsistencyHost.Contract.V1;
using Grpc.Core;

namespace ConsistencyHost.Server.Tests.EndToEnd;

public sealed class EntryCheckServiceTests
{
    private static readonly TimeSpan CallTimeout = TimeSpan.FromSeconds(60);

    [Fact]
    public async Task CheckEntry_MissingSolvent_ReturnsFindingAsData()
    {
        await using var host = await RunningHost.StartAsync(["ConsistencyHost.Rules.SpectrumMetadata"]);
        var client = new EntryCheck.EntryCheckClient(host.Channel);

        var response = await client.CheckEntryAsync(Requests.MissingSolvent(), deadline: DateTime.UtcNow + CallTimeout);

        var finding = Assert.Single(response.Findings);
        Assert.Equal("AIS-LQ-E001", response.EntryId);
        Assert.Equal("spectrum-metadata", finding.RuleId);
        Assert.Equal("solvent-not-stated", finding.Code);
        Assert.Equal(Severity.Warning, finding.Severity);
        Assert.Equal(0, Assert.Single(finding.Peaks).Spectrum);
        Assert.Equal(RuleRunStatus.Ok, Assert.Single(response.RuleRuns).Status);
    }

    [Fact]
    public async Task CheckEntry_UnknownNucleus_IsInvalidArgumentWithFieldPath()
    {
        await using var host = await RunningHost.StartAsync(["ConsistencyHost.Rules.SpectrumMetadata"]);
        var client = new EntryCheck.EntryCheckClient(host.Channel);

        var error = await Assert.ThrowsAsync<RpcException>(() =>
            client.CheckEntryAsync(Requests.UnknownNucleus(), deadline: DateTime.UtcNow + CallTimeout).ResponseAsync);

        Assert.Equal(StatusCode.InvalidArgument, error.StatusCode);
        Assert.StartsWith("spectra[0].nucleus: '77Se' is not a supported nucleus", error.Status.Detail, StringComparison.Ordinal);
        Assert.Equal("spectra[0].nucleus", error.Trailers.GetValue("field"));
    }

    [Fact]
    public async Task CheckEntries_Stream_AnswersEachEntryInOrderAndSurvivesBadOne()
    {
        await using var host = await RunningHost.StartAsync(["ConsistencyHost.Rules.SpectrumMetadata"]);
        var client = new EntryCheck.EntryCheckClient(host.Channel);
        using var call = client.CheckEntries(deadline: DateTime.UtcNow + CallTimeout);
        var sent = new[] { Requests.MissingSolvent("B-1"), Requests.UnknownNucleus("B-2"), Requests.Complete("B-3") };

        var reading = Task.Run(async () =>
        {
            var replies = new List<CheckEntryResponse>();
            await foreach (var reply in call.ResponseStream.ReadAllAsync())
            {
                replies.Add(reply);
            }

            return replies;
        });
        foreach (var request in sent)
        {
            await call.RequestStream.WriteAsync(request);
        }

        await call.RequestStream.CompleteAsync();
        var received = await reading.WaitAsync(CallTimeout);

        Assert.Equal(["B-1", "B-2", "B-3"], received.Select(r => r.EntryId));
        Assert.Single(received[0].Findings);
        Assert.Equal("spectra[0].nucleus", received[1].InputError.Field);
        Assert.Empty(received[2].Findings);
        Assert.Null(received[2].InputError);
    }

    [Fact]
    public async Task ListRules_LoadedAndFixturePlugins_ListsEachWithStatus()
    {
        await using var host = await RunningHost.StartAsync(["ConsistencyHost.Rules.SpectrumMetadata", "ConsistencyHost.Fixtures.ThrowingRule"]);
        var client = new EntryCheck.EntryCheckClient(host.Channel);

        var rules = await client.ListRulesAsync(new ListRulesRequest(), deadline: DateTime.UtcNow + CallTimeout);

        Assert.Equal(["fixture-throws", "spectrum-metadata"], rules.Rules.Select(r => r.Id));
        Assert.All(rules.Rules, r => Assert.Equal(RuleLoadStatus.Loaded, r.LoadStatus));
        Assert.Equal("ConsistencyHost.Rules.SpectrumMetadata.dll", rules.Rules[1].Plugin);
    }
}
