using System.Text.Json;
using ConsistencyHost.Tests.Shared;

namespace ConsistencyHost.Cli.Tests.Batch;

/// <summary>batch against several running hosts at once (<c>--server a,b --server c</c>).</summary>
public sealed class BatchReplicasTests : IDisposable
{
    private readonly string _work = Directory.CreateTempSubdirectory("ch-batch-replicas-").FullName;

    public void Dispose() => Directory.Delete(_work, recursive: true);

    [Fact]
    public async Task Batch_ThreeServers_GivesEachEntryOnceWithTheEmbeddedEnginesReports()
    {
        var hosts = await Task.WhenAll(ServeProcess.StartAsync(), ServeProcess.StartAsync(), ServeProcess.StartAsync());
        try
        {
            var entries = Path.Combine(RepoPaths.Samples, "entries");
            // Both forms at once: a comma-separated list and a repeated flag.
            var (remoteExit, _, remoteErr) = await CliProcess.RunAsync("batch", entries, "--out", Path.Combine(_work, "remote"),
                "--server", $"{hosts[0].Grpc},{hosts[1].Grpc}", "--server", hosts[2].Grpc.ToString());
            var (localExit, _, _) = await CliProcess.RunAsync("batch", entries, "--out", Path.Combine(_work, "local"));

            Assert.True(remoteExit == localExit, remoteErr);
            var expected = ById(Path.Combine(_work, "local"));
            var received = ById(Path.Combine(_work, "remote"));
            Assert.Equal(Directory.GetFiles(entries, "*.json").Length, received.Count);
            Assert.Equal(expected, received);
            Assert.Contains($"{received.Count} entries sent, {received.Count} reported", remoteErr);
            Assert.Contains("0 of 3 replicas lost", remoteErr);
        }
        finally
        {
            foreach (var host in hosts) host.Dispose();
        }
    }

    [Fact]
    public async Task Batch_OneServerWithUnreadableFiles_ReportsInInputOrderLikeTheEmbeddedEngine()
    {
        var folder = Directory.CreateDirectory(Path.Combine(_work, "mixed")).FullName;
        foreach (var file in Directory.GetFiles(Path.Combine(RepoPaths.Samples, "entries"), "*.json"))
        {
            File.Copy(file, Path.Combine(folder, Path.GetFileName(file)));
        }

        // Unreadable files sorted among the readable ones: first, in the middle and last.
        File.WriteAllText(Path.Combine(folder, "AIS-LQ-0000-broken.json"), "{ not json");
        File.WriteAllText(Path.Combine(folder, "AIS-LQ-0430-broken.json"), "{\"entryId\": \"AIS-LQ-0430\", \"structur\": {}}");
        File.WriteAllText(Path.Combine(folder, "AIS-LQ-9999-broken.json"), "[]");
        using var host = await ServeProcess.StartAsync();

        await CliProcess.RunAsync("batch", folder, "--out", Path.Combine(_work, "remote"), "--server", host.Grpc.ToString());
        await CliProcess.RunAsync("batch", folder, "--out", Path.Combine(_work, "local"));

        var local = EntryIds(Path.Combine(_work, "local"));
        Assert.Equal(Directory.GetFiles(folder, "*.json").Length, local.Count);
        Assert.Equal(local, EntryIds(Path.Combine(_work, "remote")));
    }

    [Fact]
    public async Task Batch_RepeatedServerAddress_IsAUsageError()
    {
        var entries = Path.Combine(RepoPaths.Samples, "entries");

        var (exit, _, stderr) = await CliProcess.RunAsync("batch", entries, "--out", Path.Combine(_work, "out"), "--server", "http://127.0.0.1:1,http://127.0.0.1:1");

        Assert.Equal(2, exit);
        Assert.Contains("--server lists http://127.0.0.1:1/ twice", stderr);
    }

    [Fact]
    public async Task Batch_SameEntryIdTwiceWithServer_IsAUsageErrorNamingTheId()
    {
        var folder = Directory.CreateDirectory(Path.Combine(_work, "twice")).FullName;
        var entry = Path.Combine(RepoPaths.Samples, "entries", "AIS-LQ-0436.json");
        File.Copy(entry, Path.Combine(folder, "a.json"));
        File.Copy(entry, Path.Combine(folder, "b.json"));

        // Nothing listens on port 1: the repeated id is found while reading, before any host could answer.
        var (exit, _, stderr) = await CliProcess.RunAsync("batch", folder, "--out", Path.Combine(_work, "out"), "--server", "http://127.0.0.1:1");

        Assert.Equal(2, exit);
        Assert.Contains("entry id 'AIS-LQ-0436' appears twice in the input (entries 1 and 2)", stderr);
    }

    private static List<string> EntryIds(string folder) =>
        [.. File.ReadLines(Path.Combine(folder, "reports.jsonl")).Select(line => JsonDocument.Parse(line).RootElement.GetProperty("entryId").GetString()!)];

    // Reports arrive in completion order over several hosts; keyed by entry id (a repeated id would throw here),
    // with rule timings and request ids blanked since they differ between runs.
    private static SortedDictionary<string, string> ById(string folder) => new(
        File.ReadLines(Path.Combine(folder, "reports.jsonl")).ToDictionary(
            line => JsonDocument.Parse(line).RootElement.GetProperty("entryId").GetString()!,
            ReportLines.WithoutRunDetails),
        StringComparer.Ordinal);
}
