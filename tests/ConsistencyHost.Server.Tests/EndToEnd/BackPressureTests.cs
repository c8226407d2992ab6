using ConsistencyHost.Contract.V1;
using ConsistencyHost.Engine.Profiles;
using ConsistencyHost.Server.Services;
using Grpc.Core;

namespace ConsistencyHost.Server.Tests.EndToEnd;

/// <summary>
/// A client that writes entries and reads no replies: the host must stop reading at its in-flight limit, so
/// HTTP/2 flow control stalls the client's writes after a bounded number, and the batch is never buffered.
/// </summary>
public sealed class BackPressureTests
{
    private static readonly TimeSpan CallTimeout = TimeSpan.FromSeconds(300);
    private const int Limit = 3;

    // Far more than the transport windows hold (Kestrel's HTTP/2 stream window is 768 KiB; an entry here is
    // ~0.3 KB): reaching it would mean the host kept reading past its limit.
    private const int MaxWrites = 20_000;

    [Fact]
    public async Task CheckEntries_ClientReadsNoReplies_WritesStallAndHostHoldsTheLimitThenAnswersAllInOrder()
    {
        var config = Path.Combine(Path.GetTempPath(), $"ch-backpressure-{Guid.NewGuid():N}.json");
        await File.WriteAllTextAsync(config, $$"""{ "Server": { "MaxEntriesInFlightPerStream": {{Limit}} } }""");
        try
        {
            await using var host = await RunningHost.StartAsync(["ConsistencyHost.Rules.SpectrumMetadata"], config);
            var inFlight = host.Service<StreamInFlight>();
            using var call = new EntryCheck.EntryCheckClient(host.Channel).CheckEntries(deadline: DateTime.UtcNow + CallTimeout);

            var (written, held) = await WriteUntilHeld(call.RequestStream, inFlight);

            Assert.NotNull(held);
            Assert.Equal(Limit, inFlight.Current);
            Assert.Equal(inFlight.Answered + Limit, inFlight.Read);
            Assert.True(inFlight.Read < written, $"the host read {inFlight.Read} of {written} written entries; the rest should wait in the transport");

            var reading = ReadAll(call.ResponseStream);
            await held.WaitAsync(CallTimeout);
            await call.RequestStream.WriteAsync(Entry(written + 1));
            await call.RequestStream.CompleteAsync();
            var replies = await reading.WaitAsync(CallTimeout);

            Assert.Equal(Enumerable.Range(0, written + 2).Select(Id), replies.Select(r => r.EntryId));
            Assert.All(replies, r => Assert.Null(r.InputError));
            Assert.Equal(Limit, inFlight.PeakPerStream);
            Assert.Equal(0, inFlight.Current);
        }
        finally
        {
            File.Delete(config);
        }
    }

    [Fact]
    public async Task Build_InFlightLimitBelowOne_IsAStartupErrorNamingTheSetting()
    {
        var config = Path.Combine(Path.GetTempPath(), $"ch-backpressure-{Guid.NewGuid():N}.json");
        await File.WriteAllTextAsync(config, """{ "Server": { "MaxEntriesInFlightPerStream": 0 } }""");
        try
        {
            var error = await Assert.ThrowsAsync<ProfileConfigurationException>(() => RunningHost.StartAsync(["ConsistencyHost.Rules.SpectrumMetadata"], config));

            Assert.Contains("Server:MaxEntriesInFlightPerStream: 0 is not allowed; expected at least 1 entry per stream", error.Problems);
        }
        finally
        {
            File.Delete(config);
        }
    }

    private static async Task<(int Written, Task? Held)> WriteUntilHeld(IClientStreamWriter<CheckEntryRequest> requests, StreamInFlight inFlight)
    {
        for (var written = 0; written < MaxWrites; written++)
        {
            var write = requests.WriteAsync(Entry(written));
            var completed = await Quiescence.CompletesOrStalls(write, () => (inFlight.Read, inFlight.Answered), () => inFlight.Current == Limit);
            if (!completed) return (written, write);
        }

        return (MaxWrites, null);
    }

    private static async Task<List<CheckEntryResponse>> ReadAll(IAsyncStreamReader<CheckEntryResponse> replies)
    {
        var received = new List<CheckEntryResponse>();
        await foreach (var reply in replies.ReadAllAsync())
        {
            received.Add(reply);
        }

        return received;
    }

    private static string Id(int index) => $"AIS-LQ-P{index:D6}";

    /// <summary>4'-Methoxyacetophenone with its 1H and 13C lines as a notebook reports them.</summary>
    private static CheckEntryRequest Entry(int index)
    {
        var request = Requests.Complete(Id(index));
        // From memory of routine CDCl3 spectra of 4'-methoxyacetophenone (typical literature values).
        request.ReportedText.Add("1H NMR (400 MHz, CDCl3) δ 7.94 (d, J = 8.9 Hz, 2H), 6.93 (d, J = 8.9 Hz, 2H), 3.87 (s, 3H), 2.55 (s, 3H).");
        request.ReportedText.Add("13C NMR (101 MHz, CDCl3) δ 196.8, 163.5, 130.6, 130.3, 113.7, 55.5, 26.3.");
        return request;
    }
}
