using System.Globalization;
using System.Text;
using System.Text.Json;
using ConsistencyHost.Chemistry.Perception.Environments;
using ConsistencyHost.Chemistry.Perception.Symmetry;
using ConsistencyHost.Cli.CommandLine;
using ConsistencyHost.Cli.Output;
using ConsistencyHost.Spectra.Analysis.Prediction;

namespace ConsistencyHost.Cli.Commands;

/// <summary>
/// <c>environments</c>: what NMR should see of a structure — formula, masses, heavy-atom, carbon and hydrogen
/// classes, expected 1H and 13C signal ranges with reasons. <c>--format json</c> prints JSON Lines, one object
/// per molecule; a molecule that cannot be read gets an <c>error</c> and the run goes on.
/// </summary>
internal static class EnvironmentsCommand
{
    private static readonly Dictionary<string, string> Valued = new(StringComparer.Ordinal)
    {
        ["--smiles"] = "--smiles",
        ["--molfile"] = "--molfile",
        ["--file"] = "--file",
        ["--format"] = "--format",
        ["--solvent"] = "--solvent",
    };

    public const string Usage = "environments (--smiles TEXT | --molfile PATH | FILE.smi|FILE.sdf) [--format text|json] [--solvent NAME]";

    public static int Run(IReadOnlyList<string> raw, TextWriter stdout)
    {
        var args = ParsedArguments.Parse(raw, Valued, []);
        var format = OutputFormats.Parse(args.Value("--format"));
        var single = args.Has("--smiles") || args.Has("--molfile");
        foreach (var item in StructureSources.From(args))
        {
            if (item.Molecule is null && single) throw new UsageException(item.Error!);
            var report = item.Molecule is null ? null : EnvironmentReport.Describe(item.Molecule);
            var shifts = item.Molecule is null ? null : ShiftWindowsOutput.Predict(item.Molecule, args.Value("--solvent"));
            stdout.Write(format == OutputFormat.Json ? Json(item, report, shifts) + "\n" : Text(item, report) + (shifts is null ? "" : ShiftWindowsOutput.Text(shifts) + "\n"));
        }

        return ExitCodes.Ok;
    }

    private static string Json(StructureItem item, EnvironmentReport? report, ClassShifts? shifts)
    {
        using var buffer = new MemoryStream();
        using (var json = new Utf8JsonWriter(buffer))
        {
            json.WriteStartObject();
            json.WriteString("id", item.Id);
            if (report is null)
            {
                json.WriteString("error", item.Error);
            }
            else
            {
                json.WriteString("formula", report.Formula);
                json.WriteNumber("monoisotopicMass", Math.Round(report.MonoisotopicMass, 6));
                json.WriteNumber("averageMass", Math.Round(report.AverageMass, 4));
                WriteClasses(json, "heavyAtomClasses", report.HeavyAtomClasses);
                WriteClasses(json, "carbonClasses13C", report.CarbonClasses13C);
                WriteClasses(json, "hydrogenClasses", report.HydrogenClasses);
                WriteRange(json, "expected1H", report.Expected1H);
                WriteRange(json, "expected13C", report.Expected13C);
                if (shifts is not null) ShiftWindowsOutput.Json(json, shifts);
                CouplingTreeOutput.Json(json, CouplingTreeOutput.Of(item.Molecule!));
            }

            json.WriteEndObject();
        }

        return Encoding.UTF8.GetString(buffer.ToArray());
    }

    private static void WriteClasses(Utf8JsonWriter json, string name, IReadOnlyList<IReadOnlyList<int>> classes)
    {
        json.WriteStartArray(name);
        foreach (var group in classes)
        {
            json.WriteStartArray();
            foreach (var atom in group) json.WriteNumberValue(atom);
            json.WriteEndArray();
        }

        json.WriteEndArray();
    }

    private static void WriteRange(Utf8JsonWriter json, string name, SignalCountRange range)
    {
        json.WriteStartObject(name);
        json.WriteNumber("min", range.Min);
        json.WriteNumber("max", range.Max);
        json.WriteStartArray("reasons");
        foreach (var reason in range.Reasons) json.WriteStringValue(reason);
        json.WriteEndArray();
        json.WriteEndObject();
    }

    private static string Text(StructureItem item, EnvironmentReport? report)
    {
        if (report is null) return $"{item.Id}: cannot be read: {item.Error}\n\n";
        var text = new StringBuilder();
        text.Append(CultureInfo.InvariantCulture, $"{item.Id}: {report.Formula}, monoisotopic {report.MonoisotopicMass:0.00000}, average {report.AverageMass:0.000}\n");
        text.Append(CultureInfo.InvariantCulture, $"  heavy-atom classes ({report.HeavyAtomClasses.Count}): {Classes(report.HeavyAtomClasses)}\n");
        text.Append(CultureInfo.InvariantCulture, $"  13C classes ({report.CarbonClasses13C.Count}): {Classes(report.CarbonClasses13C)}\n");
        text.Append(CultureInfo.InvariantCulture, $"  1H classes ({report.HydrogenClasses.Count}): {Classes(report.HydrogenClasses)}\n");
        text.Append(Range("1H", report.Expected1H)).Append(Range("13C", report.Expected13C));
        text.Append("  coupling trees:\n").Append(CouplingTreeOutput.Text(CouplingTreeOutput.Of(item.Molecule!))).Append('\n');
        return text.ToString();
    }

    private static string Classes(IReadOnlyList<IReadOnlyList<int>> classes) =>
        string.Join(" ", classes.Select(c => "{" + string.Join(",", c) + "}"));

    private static string Range(string nucleus, SignalCountRange range)
    {
        var count = range.Min == range.Max ? $"{range.Min}" : $"{range.Min}-{range.Max}";
        var reasons = range.Reasons.Count > 0 ? " (" + string.Join("; ", range.Reasons) + ")" : "";
        return $"  expected {nucleus} signals: {count}{reasons}\n";
    }
}
