using System.Diagnostics;

namespace ConsistencyHost.Chemistry.Tests.Oracle;

/// <summary>Runs the committed RDKit script once per test run and parses its output.</summary>
internal static class RdkitOracle
{
    public const string Python = "/usr/bin/python3";
    public const string Nci5K = "/usr/share/RDKit/Data/NCI/first_5K.smi";

    private static readonly Lazy<(IReadOnlyList<OracleRow> Rows, string? Error)> Cached = new(Run);

    private static readonly System.Collections.Concurrent.ConcurrentDictionary<string, Lazy<(string, string?)>> CachedSdf = new(StringComparer.Ordinal);

    public static (IReadOnlyList<OracleRow> Rows, string? Error) Rows => Cached.Value;

    /// <summary>Output lines of rdkit_topicity.py (probe substitution) for a .smi file.</summary>
    public static (string Text, string? Error) Topicity(string smiPath) => ExecuteScript("rdkit_topicity.py", smiPath);

    /// <summary>Output lines of rdkit_variants.py: each molecule written in RDKit's order, a random order and Kekulé form.</summary>
    public static (string Text, string? Error) Variants(string smiPath, int count) =>
        ExecuteScript("rdkit_variants.py", smiPath, count.ToString(System.Globalization.CultureInfo.InvariantCulture));

    /// <summary>Committed stereo cases (the NCI set carries no configurations).</summary>
    public static string StereoCases => Path.Combine(AppContext.BaseDirectory, "Oracle", "stereo_cases.smi");

    /// <summary>RDKit-written molfiles (SD text) of every molecule of a .smi file RDKit parses, with the input line.</summary>
    public static (string Text, string? Error) Sdf(string smiPath) =>
        CachedSdf.GetOrAdd(smiPath, p => new Lazy<(string, string?)>(() => Execute("sdf", p))).Value;

    private static (IReadOnlyList<OracleRow>, string?) Run()
    {
        var (stdout, error) = Execute(Nci5K);
        if (error is not null)
        {
            return ([], error);
        }

        var rows = new List<OracleRow>();
        foreach (var line in stdout.Split('\n', StringSplitOptions.RemoveEmptyEntries))
        {
            rows.Add(OracleRow.Parse(line));
        }

        return (rows, null);
    }

    private static (string Text, string? Error) Execute(params string[] arguments) => ExecuteScript("rdkit_oracle.py", arguments);

    private static (string Text, string? Error) ExecuteScript(string scriptName, params string[] arguments)
    {
        if (!File.Exists(Python) || !File.Exists(Nci5K))
        {
            return (string.Empty, $"RDKit oracle needs {Python} and {Nci5K}; install python3-rdkit and rdkit-data (Debian).");
        }

        var script = Path.Combine(AppContext.BaseDirectory, "Oracle", scriptName);
        var info = new ProcessStartInfo(Python, [script, .. arguments])
        {
            RedirectStandardOutput = true,
            RedirectStandardError = true,
            UseShellExecute = false,
        };
        using var process = Process.Start(info)!;
        var stderr = process.StandardError.ReadToEndAsync();
        var stdout = process.StandardOutput.ReadToEnd();
        process.WaitForExit();
        return process.ExitCode == 0
            ? (stdout, null)
            : (string.Empty, $"RDKit oracle failed (exit {process.ExitCode}); is python3-rdkit installed? {stderr.Result}");
    }
}

/// <summary>One line of oracle output.</summary>
internal sealed record OracleRow(string Name, bool Parsed, string Formula, double ExactMass, int[] Ranks)
{
    public static OracleRow Parse(string line)
    {
        var f = line.Split('\t');
        if (f[1] != "OK")
        {
            return new OracleRow(f[0], false, string.Empty, 0, []);
        }

        var ranks = Array.ConvertAll(f[4].Split(','), s => int.Parse(s, System.Globalization.CultureInfo.InvariantCulture));
        return new OracleRow(f[0], true, f[2], double.Parse(f[3], System.Globalization.CultureInfo.InvariantCulture), ranks);
    }
}
