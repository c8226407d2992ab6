using System.Text.Json;

namespace ConsistencyHost.Cli.Tests;

/// <summary>The environments and peaks commands' contracts: fields, JSON Lines, exit codes.</summary>
public sealed class StructureAndPeakCommandTests
{
    [Fact]
    public async Task Environments_Smiles_PrintsContractFields()
    {
        // 4'-Methoxyacetophenone: C9H10O2, monoisotopic 150.068080 (NIST masses; nmr-data-standards §7);
        // seven carbon environments, five hydrogen environments (common practice: para-disubstituted ring).
        var (exit, stdout, _) = await CliProcess.RunAsync("environments", "--smiles", "COc1ccc(cc1)C(C)=O", "--format", "json");

        Assert.Equal(0, exit);
        using var json = JsonDocument.Parse(stdout);
        var root = json.RootElement;
        Assert.Equal("C9H10O2", root.GetProperty("formula").GetString());
        Assert.Equal(150.06808, root.GetProperty("monoisotopicMass").GetDouble(), 4);
        Assert.Equal(7, root.GetProperty("carbonClasses13C").GetArrayLength());
        Assert.Equal(4, root.GetProperty("hydrogenClasses").GetArrayLength());
        Assert.Equal(4, root.GetProperty("expected1H").GetProperty("max").GetInt32());
        Assert.Equal(7, root.GetProperty("expected13C").GetProperty("min").GetInt32());
    }

    [Fact]
    public async Task Environments_SmilesFile_OneLinePerMoleculeAndErrorsInline()
    {
        var file = Path.Combine(Path.GetTempPath(), $"ch-env-{Guid.NewGuid():N}.smi");
        await File.WriteAllTextAsync(file, "CC(=O)Oc1ccccc1C(=O)O\taspirin\nC1CC\tbroken\nc1ccncc1\tpyridine\n");
        try
        {
            var (exit, stdout, _) = await CliProcess.RunAsync("environments", file, "--format", "json");

            Assert.Equal(0, exit);
            var lines = stdout.Split('\n', StringSplitOptions.RemoveEmptyEntries).Select(l => JsonDocument.Parse(l).RootElement).ToList();
            Assert.Equal(["aspirin", "broken", "pyridine"], lines.Select(l => l.GetProperty("id").GetString()));
            Assert.Equal("C9H8O4", lines[0].GetProperty("formula").GetString());
            Assert.True(lines[1].TryGetProperty("error", out _));
            Assert.Equal(3, lines[2].GetProperty("hydrogenClasses").GetArrayLength());
        }
        finally
        {
            File.Delete(file);
        }
    }

    [Fact]
    public async Task Peaks_ReportedText_PrintsUnderstoodSignals()
    {
        var (exit, stdout, _) = await CliProcess.RunAsync("peaks", "--format", "json",
            "--data", "1H NMR (400 MHz, CDCl3) δ 7.31–7.24 (m, 5H), 4.12 (q, J = 7.1 Hz, 2H), 1.26 (bs, 1H). 13C NMR (101 MHz, CDCl3) δ 171.1, 128.4 (2C).");

        Assert.Equal(0, exit);
        using var json = JsonDocument.Parse(stdout);
        var spectra = json.RootElement.GetProperty("spectra");
        var first = spectra[0].GetProperty("signals");
        Assert.Equal("1H", spectra[0].GetProperty("nucleus").GetString());
        Assert.Equal(400, spectra[0].GetProperty("frequencyMHz").GetDouble());
        Assert.Equal(7.24, first[0].GetProperty("rangeLowPpm").GetDouble());
        Assert.Equal(7.1, first[1].GetProperty("couplingsHz")[0].GetDouble());
        Assert.Equal("br s", first[2].GetProperty("multiplicity").GetString());
        Assert.Equal(2, spectra[1].GetProperty("signals")[1].GetProperty("carbonCount").GetInt32());
    }

    [Fact]
    public async Task Peaks_UnreadableText_ExitsTwoWithOffsetAndFragment()
    {
        var (exit, stdout, stderr) = await CliProcess.RunAsync("peaks", "--data", "1H NMR (400 MHz, CDCl3) δ 7.31 (mx, 5H)");

        Assert.Equal(2, exit);
        Assert.Equal("", stdout);
        Assert.Contains("offset 32", stderr, StringComparison.Ordinal);
        Assert.Contains("'mx'", stderr, StringComparison.Ordinal);
    }
}
