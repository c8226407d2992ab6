using ConsistencyHost.Contract.V1;
using ConsistencyHost.Dispatch;
using ConsistencyHost.Tests.Shared;
using Grpc.Health.V1;
using Grpc.Net.Client;
using Xunit.Abstractions;

namespace ConsistencyHost.Server.Tests.Replicas;

/// <summary>
/// Three real hosts (`consistencyhost serve` processes), 2,000 NCI entries dispatched over them, one host killed
/// outright after about a third of the reports: every entry must still be reported exactly once.
/// </summary>
public sealed class ReplicaKillTests(ITestOutputHelper output)
{
    private const int Entries = 2000;

    [Fact(Timeout = 120_000)] // a hang guard, not a timing assertion: a lost entry would otherwise wait for ever
    public async Task Dispatch_ReplicaKilledAfterAThird_ReportsEveryEntryExactlyOnce()
    {
        var reading = NciEntries.ReadAsync(Entries); // RDKit runs while the hosts start
        var hosts = await Task.WhenAll(ServeProcess.StartAsync(), ServeProcess.StartAsync(), ServeProcess.StartAsync());
        try
        {
            var entries = await reading;
            using var dispatcher = ReplicaDispatcher.Connect(hosts.Select(host => host.Grpc));
            var run = dispatcher.Dispatch(entries.ToAsyncEnumerable());
            var seen = new Dictionary<string, int>(StringComparer.Ordinal);
            var reportedAtKill = -1;
            await foreach (var report in run)
            {
                seen[report.EntryId] = seen.GetValueOrDefault(report.EntryId) + 1;
                if (seen.Count == Entries / 3)
                {
                    hosts[1].Kill();
                    reportedAtKill = seen.Count;
                }
            }

            var summary = run.Summary;
            Assert.Equal(entries.Select(entry => entry.EntryId).Order(StringComparer.Ordinal), seen.Keys.Order(StringComparer.Ordinal)); // none lost, none extra
            Assert.All(seen, pair => Assert.True(pair.Value == 1, $"entry {pair.Key} was reported {pair.Value} times"));  // none doubled
            Assert.Equal((Entries, Entries, 1), (summary.Sent, summary.Reported, summary.ReplicasLost));
            Assert.True(summary.Resubmitted > 0, summary.ToString());

            var killed = summary.Replicas[1];
            Assert.True(killed.Failures >= 1, killed.ToString());
            Assert.True(killed.Reported <= reportedAtKill, $"the killed host reported {killed.Reported} entries, more than the {reportedAtKill} seen when it was killed");
            Assert.Equal(Entries - killed.Reported, summary.Replicas[0].Reported + summary.Replicas[2].Reported); // its share went to the others
            Assert.All(new[] { summary.Replicas[0], summary.Replicas[2] }, tally => Assert.Equal(0, tally.Failures));

            Assert.True(hosts[1].HasExited);
            Assert.Equal(HealthCheckResponse.Types.ServingStatus.Serving, await HealthAsync(hosts[0]));
            Assert.Equal(HealthCheckResponse.Types.ServingStatus.Serving, await HealthAsync(hosts[2]));
            // The figures docs/reliability.md quotes (dotnet test ... --logger "console;verbosity=detailed").
            output.WriteLine($"{summary}; killed after {reportedAtKill} reports; per replica: {string.Join("; ", summary.Replicas)}");
        }
        finally
        {
            foreach (var host in hosts) host.Dispose();
        }
    }

    private static async Task<HealthCheckResponse.Types.ServingStatus> HealthAsync(ServeProcess host)
    {
        using var channel = GrpcChannel.ForAddress(host.Grpc);
        var reply = await new Health.HealthClient(channel).CheckAsync(new HealthCheckRequest(), deadline: DateTime.UtcNow.AddSeconds(30));
        return reply.Status;
    }
}
