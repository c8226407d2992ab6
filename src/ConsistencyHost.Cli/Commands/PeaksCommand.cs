using System.Text;
using System.Text.Json;
using ConsistencyHost.Cli.CommandLine;
using ConsistencyHost.Cli.Output;
using ConsistencyHost.Engine.Intake;
using ConsistencyHost.Spectra.Model;
using ConsistencyHost.Spectra.Reported;

namespace ConsistencyHost.Cli.Commands;

/// <summary>
/// <c>peaks</c>: reads reported text (or a JCAMP-DX / NMReDATA file) and prints what was understood, so a
/// chemist can see how the tool read the text. Unreadable input exits 2 with the offset and fragment on stderr.
/// </summary>
internal static class PeaksCommand
{
    private static readonly Dictionary<string, string> Valued = new(StringComparer.Ordinal)
    {
        ["--data"] = "--data",
        ["--nmr"] = "--data",
        ["--jcamp"] = "--jcamp",
        ["--nmredata"] = "--nmredata",
        ["--format"] = "--format",
    };

    public const string Usage = "peaks (--data TEXT | --jcamp PATH | --nmredata PATH) [--lenient] [--format text|json]\n" +
        "      --lenient prints what was read and lists each unreadable fragment on stderr instead of refusing the text.";

    public static int Run(IReadOnlyList<string> raw, TextWriter stdout)
    {
        var args = ParsedArguments.Parse(raw, Valued, ["--lenient"]);
        var format = OutputFormats.Parse(args.Value("--format"));
        var (spectra, hrms) = Read(args, Console.Error);
        stdout.Write(format == OutputFormat.Json ? Json(spectra, hrms) + "\n" : Text(spectra, hrms));
        return ExitCodes.Ok;
    }

    private static (List<Spectrum> Spectra, List<HrmsClaim> Hrms) Read(ParsedArguments args, TextWriter stderr)
    {
        var lenient = args.Has("--lenient");
        var spectra = new List<Spectrum>();
        var hrms = new List<HrmsClaim>();
        try
        {
            foreach (var (text, i) in args.Values("--data").Select((t, i) => (t, i)))
            {
                var read = lenient
                    ? EntryTextReaders.ReadReportedTextLeniently(text, $"--data[{i}]", note => stderr.WriteLine(note))
                    : EntryTextReaders.ReadReportedText(text, $"--data[{i}]");
                spectra.AddRange(read.Spectra);
                hrms.AddRange(read.Hrms);
            }

            foreach (var path in args.Values("--jcamp"))
            {
                spectra.AddRange(EntryTextReaders.ReadJcamp(CheckCommand.ReadFile(path, "--jcamp"), path));
            }

            foreach (var path in args.Values("--nmredata"))
            {
                spectra.AddRange(EntryTextReaders.ReadNmredataSpectra(CheckCommand.ReadFile(path, "--nmredata"), path));
            }
        }
        catch (EntryInputException error)
        {
            throw new UsageException($"{error.Field}: {error.Reason}");
        }

        return spectra.Count + hrms.Count > 0 ? (spectra, hrms) : throw new UsageException("give --data TEXT, --jcamp PATH or --nmredata PATH");
    }

    private static string Json(IReadOnlyList<Spectrum> spectra, IReadOnlyList<HrmsClaim> hrms)
    {
        using var buffer = new MemoryStream();
        using (var json = new Utf8JsonWriter(buffer))
        {
            json.WriteStartObject();
            json.WriteStartArray("spectra");
            foreach (var spectrum in spectra) PeaksJson.WriteSpectrum(json, spectrum);
            json.WriteEndArray();
            json.WriteStartArray("hrms");
            foreach (var claim in hrms) PeaksJson.WriteHrms(json, claim);
            json.WriteEndArray();
            json.WriteEndObject();
        }

        return Encoding.UTF8.GetString(buffer.ToArray());
    }

    private static string Text(IReadOnlyList<Spectrum> spectra, IReadOnlyList<HrmsClaim> hrms)
    {
        var text = new StringBuilder();
        foreach (var spectrum in spectra)
        {
            text.Append(ReportedTextFormatter.Format(spectrum)).Append("\n  ").Append(spectrum.Signals.Count).Append(" signal(s)\n");
        }

        foreach (var claim in hrms)
        {
            text.Append(System.Globalization.CultureInfo.InvariantCulture, $"HRMS {claim.IonLabel}: calculated {claim.CalculatedMz} for {claim.IonFormula}, found {claim.FoundMz}\n");
        }

        return text.ToString();
    }
}
