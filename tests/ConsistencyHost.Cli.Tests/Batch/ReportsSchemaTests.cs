using System.Text.Json;
using System.Text.Json.Nodes;
using ConsistencyHost.Tests.Shared;
using Json.Schema;

namespace ConsistencyHost.Cli.Tests.Batch;

/// <summary>
/// docs/api/reports.schema.json describes reports.jsonl: every line of real batch output (the sample notebook, an
/// entry with a broken SMILES, a file that is not JSON; embedded and through a running host) validates against it,
/// with a general-purpose JSON Schema 2020-12 validator (JsonSchema.Net), and a line with a field the schema does not
/// know does not.
/// </summary>
public sealed class ReportsSchemaTests : IDisposable
{
    private static readonly JsonSchema Schema = JsonSchema.FromFile(Path.Combine(RepoPaths.Root, "docs", "api", "reports.schema.json"));
    private static readonly EvaluationOptions ListErrors = new() { OutputFormat = OutputFormat.List };
    private readonly string _work = Directory.CreateTempSubdirectory("ch-batch-schema-").FullName;

    public void Dispose() => Directory.Delete(_work, recursive: true);

    [Fact]
    public async Task Batch_EmbeddedAndThroughHost_EveryLineValidatesAgainstTheSchema()
    {
        var entries = NotebookWithBadEntries();
        using var host = await ServeProcess.StartAsync();

        var (localExit, _, localErr) = await CliProcess.RunAsync("batch", entries, "--out", Path.Combine(_work, "local"));
        var (remoteExit, _, remoteErr) = await CliProcess.RunAsync("batch", entries, "--out", Path.Combine(_work, "remote"), "--server", host.Grpc.ToString());

        Assert.True(localExit == 1, localErr);
        Assert.True(remoteExit == 1, remoteErr);
        var local = File.ReadAllLines(Path.Combine(_work, "local", "reports.jsonl"));
        var remote = File.ReadAllLines(Path.Combine(_work, "remote", "reports.jsonl"));
        Assert.Equal(5, local.Length);
        Assert.Equal(5, remote.Length);
        Assert.All(local.Concat(remote), line => Assert.True(Valid(line, out var errors), errors));
        // The output covers the optional parts: reports with a structure, input errors, and request ids from the host.
        Assert.Equal(2, local.Count(line => line.Contains("\"inputError\"", StringComparison.Ordinal)));
        // Every entry the host answered carries its call's id; the file that is not JSON never left the command line.
        var ids = remote.Select(line => JsonNode.Parse(line)).ToDictionary(r => r!["entryId"]!.GetValue<string>(), r => r!["requestId"]!.GetValue<string>());
        Assert.Equal("", ids["AIS-LQ-0491"]);
        Assert.All(ids.Where(id => id.Key != "AIS-LQ-0491"), id => Assert.Matches("^[0-9a-f]{32}$", id.Value));
    }

    [Theory]
    [InlineData("findings", "ruleID")]
    [InlineData("", "entryID")]
    public async Task Schema_LineWithAFieldItDoesNotKnow_IsInvalid(string where, string misspelt)
    {
        var (exit, stdout, stderr) = await CliProcess.RunAsync("check", Path.Combine(RepoPaths.Samples, "entries", "AIS-LQ-0436.json"), "--format", "json");
        Assert.True(exit is 0 or 1, stderr);
        var report = JsonNode.Parse(stdout)!.AsObject();
        Assert.True(Valid(report.ToJsonString(), out var errors), errors);
        var target = where.Length == 0 ? report : report[where]![0]!.AsObject();
        var name = misspelt.Replace("ID", "Id", StringComparison.Ordinal);
        var value = target[name]!.DeepClone();
        target.Remove(name);
        target[misspelt] = value;

        Assert.False(Valid(report.ToJsonString(), out _));
    }

    private static bool Valid(string line, out string errors)
    {
        using var document = JsonDocument.Parse(line);
        var result = Schema.Evaluate(document.RootElement, ListErrors);
        errors = string.Join("; ", (result.Details ?? []).Where(d => d.Errors is not null)
            .SelectMany(d => d.Errors!.Select(e => $"{d.InstanceLocation}: {e.Key} {e.Value}"))) + " in " + line;
        return result.IsValid;
    }

    /// <summary>The sample notebook plus an entry whose SMILES leaves a branch open and a file that is not JSON.</summary>
    private string NotebookWithBadEntries()
    {
        var folder = Directory.CreateDirectory(Path.Combine(_work, "entries")).FullName;
        foreach (var file in Directory.GetFiles(Path.Combine(RepoPaths.Samples, "entries"), "*.json"))
        {
            File.Copy(file, Path.Combine(folder, Path.GetFileName(file)));
        }

        // 4'-methoxyacetophenone with its branch left open (OpenSMILES: every "(" needs its ")").
        File.WriteAllText(Path.Combine(folder, "AIS-LQ-0490.json"), """{ "entryId": "AIS-LQ-0490", "structure": { "smiles": "COc1ccc(cc1C(C)=O" } }""");
        File.WriteAllText(Path.Combine(folder, "AIS-LQ-0491.json"), "{ \"entryId\": ");
        return folder;
    }
}
