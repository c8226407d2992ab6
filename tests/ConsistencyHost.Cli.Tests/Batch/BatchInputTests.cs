using System.Diagnostics;
using System.Text.Json;
using ConsistencyHost.Tests.Shared;

namespace ConsistencyHost.Cli.Tests.Batch;

/// <summary>batch reading an SD file written by RDKit, and batch against a running host.</summary>
public sealed class BatchInputTests : IDisposable
{
    private readonly string _work = Directory.CreateTempSubdirectory("ch-batch-input-").FullName;

    public void Dispose() => Directory.Delete(_work, recursive: true);

    [Fact]
    public async Task Batch_PlainSdFromRdkit_ReadsDataItemsAndReportsBrokenRecordInPlace()
    {
        var sdf = Path.Combine(_work, "notebook.sdf");
        await WriteSdWithRdkitAsync(sdf);
        var json = Path.Combine(RepoPaths.Samples, "entries", "AIS-LQ-0436.json");

        var (exit, stdout, stderr) = await CliProcess.RunAsync("batch", sdf, "--out", Path.Combine(_work, "out"));
        var (_, fromJson, _) = await CliProcess.RunAsync("check", json, "--format", "json");

        Assert.True(exit == 1, stderr + stdout);
        var lines = File.ReadAllLines(Path.Combine(_work, "out", "reports.jsonl"));
        Assert.Equal(2, lines.Length);
        using var first = JsonDocument.Parse(lines[0]);
        using var expected = JsonDocument.Parse(fromJson);
        Assert.Equal("AIS-LQ-0436", first.RootElement.GetProperty("entryId").GetString());
        // The same entry as a molfile with data items is read as the JSON entry with SMILES is.
        Assert.Equal(Codes(expected.RootElement), Codes(first.RootElement));
        Assert.Equal("C9H10O2", first.RootElement.GetProperty("structure").GetProperty("formula").GetString());
        using var second = JsonDocument.Parse(lines[1]);
        var error = second.RootElement.GetProperty("inputError");
        Assert.StartsWith("notebook.sdf record 2 (line ", error.GetProperty("field").GetString(), StringComparison.Ordinal);
        Assert.Contains("M  END", error.GetProperty("reason").GetString(), StringComparison.Ordinal);
    }

    [Fact]
    public async Task Batch_WithServer_GivesTheEmbeddedEnginesReports()
    {
        using var host = await ServeProcess.StartAsync();
        var entries = Path.Combine(RepoPaths.Samples, "entries");

        var (remoteExit, _, remoteErr) = await CliProcess.RunAsync("batch", entries, "--out", Path.Combine(_work, "remote"), "--server", host.Grpc.ToString());
        var (localExit, _, _) = await CliProcess.RunAsync("batch", entries, "--out", Path.Combine(_work, "local"));

        Assert.True(remoteExit == localExit, remoteErr);
        Assert.Equal(Comparable(Path.Combine(_work, "local")), Comparable(Path.Combine(_work, "remote")));
    }

    private static string[] Codes(JsonElement report) =>
        [.. report.GetProperty("findings").EnumerateArray().Select(f => f.GetProperty("ruleId").GetString() + "/" + f.GetProperty("code").GetString())];

    // Rule timings differ between runs, and only a host's reports carry its call's request id; everything else must be equal.
    private static IEnumerable<string> Comparable(string folder) => File.ReadLines(Path.Combine(folder, "reports.jsonl"))
        .Select(ReportLines.WithoutRunDetails);

    /// <summary>RDKit writes the molfile and data items (its SDWriter is the reference for the format here).</summary>
    private static async Task WriteSdWithRdkitAsync(string path)
    {
        // 4'-Methoxyacetophenone, the text of samples/entries/AIS-LQ-0436.json; the second record lacks "M  END".
        const string Script = """
            import sys
            from rdkit import Chem
            mol = Chem.MolFromSmiles("COc1ccc(cc1)C(C)=O")
            mol.SetProp("_Name", "4'-methoxyacetophenone")
            mol.SetProp("ENTRY_ID", "AIS-LQ-0436")
            mol.SetProp("FORMULA", "C9H10O2")
            mol.SetProp("NMR_1H", "1H NMR (400 MHz, CDCl3) δ 7.94 (d, J = 8.9 Hz, 2H), 7.26 (s, 1H), 6.93 (d, J = 8.9 Hz, 2H), 3.87 (s, 3H), 2.56 (s, 3H).")
            mol.SetProp("NMR_13C", "13C NMR (101 MHz, CDCl3) δ 196.8, 163.5, 130.6, 130.3, 113.7, 55.5, 26.4.")
            mol.SetProp("HRMS", "HRMS (ESI) m/z: [M + H]+ calcd for C9H11O2 151.0759; found 151.0757.")
            writer = Chem.SDWriter(sys.argv[1])
            writer.write(mol)
            writer.close()
            with open(sys.argv[1], "a", encoding="utf-8") as f:
                f.write("broken\n  no counts line\n\n>  <ENTRY_ID>\nAIS-LQ-0999\n\n$$$$\n")
            """;
        var start = new ProcessStartInfo("/usr/bin/python3") { RedirectStandardError = true };
        start.ArgumentList.Add("-c");
        start.ArgumentList.Add(Script);
        start.ArgumentList.Add(path);
        using var process = Process.Start(start)!;
        var stderr = process.StandardError.ReadToEndAsync();
        using var timeout = new CancellationTokenSource(TimeSpan.FromMinutes(1));
        await process.WaitForExitAsync(timeout.Token);
        Assert.True(process.ExitCode == 0, "RDKit (Debian python3-rdkit) could not write the SD file: " + await stderr);
    }
}
