using System.Text.Json;

namespace ConsistencyHost.Cli.Tests;

/// <summary>
/// The coupling trees <c>environments</c> prints, against ethyl acetate as Gottlieb 1997 reports it in CDCl3:
/// CH3C(O) 2.05 s, OCH2 4.12 q, CH3 1.26 t, J = 7.13 Hz (nmr-data-standards, Gottlieb table and the JCAMP-DX
/// example built from it).
/// </summary>
public sealed class EnvironmentsCouplingTreeTests
{
    private const string EthylAcetate = "CCOC(C)=O";
    private const double GottliebJHz = 7.13;

    [Fact]
    public async Task Environments_Json_CouplingTreesGiveTheReportedPatterns()
    {
        var (exit, stdout, stderr) = await CliProcess.RunAsync("environments", "--smiles", EthylAcetate, "--format", "json");

        Assert.True(exit == 0, stderr);
        using var json = JsonDocument.Parse(stdout);
        var root = json.RootElement;
        var trees = root.GetProperty("couplingTrees");
        Assert.Equal(root.GetProperty("hydrogenClasses").GetArrayLength(), trees.GetArrayLength());

        Assert.Equal("t", TreeOfParent(root, 0).GetProperty("pattern").GetString());
        Assert.Equal("q", TreeOfParent(root, 1).GetProperty("pattern").GetString());
        Assert.Equal("s", TreeOfParent(root, 4).GetProperty("pattern").GetString());

        // The OCH2's one branch: three protons of the ethyl CH3, three bonds away, and Gottlieb's J inside its range.
        var branch = Assert.Single(TreeOfParent(root, 1).GetProperty("couplings").EnumerateArray());
        Assert.Equal(ClassOfParent(root, 0), branch.GetProperty("partnerClass").GetInt32());
        Assert.Equal(3, branch.GetProperty("count").GetInt32());
        Assert.Equal(3, branch.GetProperty("bonds").GetInt32());
        Assert.InRange(GottliebJHz, branch.GetProperty("minHz").GetDouble(), branch.GetProperty("maxHz").GetDouble());
        Assert.False(string.IsNullOrWhiteSpace(branch.GetProperty("source").GetString()));
    }

    [Fact]
    public async Task Environments_Text_PrintsOneTreeLinePerHydrogenClass()
    {
        var (exit, stdout, stderr) = await CliProcess.RunAsync("environments", "--smiles", EthylAcetate);

        Assert.True(exit == 0, stderr);
        Assert.Contains("coupling trees:", stdout, StringComparison.Ordinal);
        Assert.Equal(3, stdout.Split('\n').Count(l => l.TrimStart().StartsWith("H class ", StringComparison.Ordinal)));
        Assert.Contains(": q — 3 H of class", stdout, StringComparison.Ordinal);
    }

    private static int ClassOfParent(JsonElement root, int atom)
    {
        var classes = root.GetProperty("hydrogenClasses").EnumerateArray().ToList();
        return classes.FindIndex(c => c.EnumerateArray().Any(a => a.GetInt32() == atom));
    }

    private static JsonElement TreeOfParent(JsonElement root, int atom)
    {
        var cls = ClassOfParent(root, atom);
        return root.GetProperty("couplingTrees").EnumerateArray().Single(t => t.GetProperty("class").GetInt32() == cls);
    }
}
