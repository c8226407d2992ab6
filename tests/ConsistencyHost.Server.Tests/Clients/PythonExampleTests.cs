using System.Globalization;
using System.Text.Json;
using ConsistencyHost.Contract.V1;
using ConsistencyHost.Server.Tests.EndToEnd;
using ConsistencyHost.Server.Tests.Interop;
using ConsistencyHost.Tests.Shared;
using Google.Protobuf;

namespace ConsistencyHost.Server.Tests.Clients;

/// <summary>The Python example (samples/clients/python) against the real host, compared with a gRPC call from C#.</summary>
public sealed class PythonExampleTests
{
    [Fact]
    public async Task CheckEntryExample_SampleEntry_PrintsTheHostsReport()
    {
        await using var host = await RunningHost.StartAsync(["ConsistencyHost.Rules.SpectrumMetadata", "ConsistencyHost.Rules.SolventResidual"]);
        var script = Path.Combine(RepoPaths.Samples, "clients", "python", "check_entry.py");
        var entry = Path.Combine(RepoPaths.Samples, "entries", "AIS-LQ-0422.json");
        var address = "127.0.0.1:" + host.Port.ToString(CultureInfo.InvariantCulture);

        var (exit, stdout, stderr) = await PythonClientTests.RunAsync("/usr/bin/python3", script, Path.Combine(RepoPaths.Root, "proto"), address, entry);
        var expected = await new EntryCheck.EntryCheckClient(host.Channel).CheckEntryAsync(
            JsonParser.Default.Parse<CheckEntryRequest>(await File.ReadAllTextAsync(entry)), deadline: DateTime.UtcNow.AddMinutes(1));

        Assert.True(exit == 0, stderr);
        using var json = JsonDocument.Parse(stdout);
        Assert.Equal("AIS-LQ-0422", json.RootElement.GetProperty("entryId").GetString());
        var codes = json.RootElement.GetProperty("findings").EnumerateArray().Select(f => f.GetProperty("code").GetString());
        Assert.Equal(expected.Findings.Select(f => f.Code), codes);
        Assert.Contains("solvent-not-stated", codes);
    }
}
