using ConsistencyHost.Cli.CommandLine;
using ConsistencyHost.Cli.Output;
using ConsistencyHost.Contract.Mapping;
using ConsistencyHost.Contract.V1;
using ConsistencyHost.Engine.Intake;
using Google.Protobuf;

namespace ConsistencyHost.Cli.Commands;

/// <summary>
/// <c>check</c>: runs the embedded engine on one entry, given as a request file (the proto's JSON mapping)
/// and/or flags. Exit 0 when no finding is an error, 1 when one is, 2 for unusable input.
/// </summary>
internal static class CheckCommand
{
    private static readonly Dictionary<string, string> Valued = new(EngineFactory.EngineOptions, StringComparer.Ordinal)
    {
        ["--smiles"] = "--smiles",
        ["--molfile"] = "--molfile",
        ["--data"] = "--data",
        ["--nmr"] = "--data",
        ["--jcamp"] = "--jcamp",
        ["--nmredata"] = "--nmredata",
        ["--formula"] = "--formula",
        ["--profile"] = "--profile",
        ["--id"] = "--id",
        ["--format"] = "--format",
    };

    public const string Usage =
        "check [ENTRY.json] [--smiles TEXT | --molfile PATH] [--data TEXT]... [--jcamp PATH] [--nmredata PATH] [--formula F]\n" +
        "      [--id ENTRY_ID] [--profile NAME] [--strict] [--format text|json] [--plugins DIR] [--config FILE]\n" +
        "      Reported text is read leniently: an unreadable fragment is a text-unreadable warning and the rest is\n" +
        "      checked; --strict refuses the entry instead (exit 2).";

    public static int Run(IReadOnlyList<string> raw, TextWriter stdout)
    {
        var args = ParsedArguments.Parse(raw, Valued, ["--strict"]);
        var format = OutputFormats.Parse(args.Value("--format"));
        var request = BuildRequest(args);
        var engine = EngineFactory.Create(args);
        try
        {
            var report = engine.Check(SubmissionMapper.ToSubmission(request));
            var response = ReportMapper.ToResponse(report);
            stdout.Write(format == OutputFormat.Json ? JsonOutput.Format(response) + "\n" : TextReport.Format(response));
            return response.HighestSeverity == Severity.Error ? ExitCodes.ErrorFindings : ExitCodes.Ok;
        }
        catch (EntryInputException error)
        {
            throw new UsageException($"{error.Field}: {error.Reason}");
        }
    }

    private static CheckEntryRequest BuildRequest(ParsedArguments args)
    {
        if (args.Positional.Count > 1) throw new UsageException("check takes at most one entry file");
        var request = args.Positional.Count == 1 ? ReadEntryFile(args.Positional[0]) : new CheckEntryRequest();
        if (args.Value("--smiles") is { } smiles) request.Structure = new Structure { Smiles = smiles };
        if (args.Value("--molfile") is { } molfile) request.Structure = new Structure { Molfile = ReadFile(molfile, "--molfile") };
        if (args.Has("--smiles") && args.Has("--molfile")) throw new UsageException("give --smiles or --molfile, not both");
        request.ReportedText.AddRange(args.Values("--data"));
        foreach (var jcamp in args.Values("--jcamp"))
        {
            request.Spectra.Add(new SpectrumInput { JcampDx = ReadFile(jcamp, "--jcamp") });
        }

        if (args.Value("--nmredata") is { } nmredata) request.NmredataRecord = ReadFile(nmredata, "--nmredata");
        if (args.Value("--formula") is { } formula) (request.Claims ??= new Claims()).Formula = formula;
        if (args.Value("--profile") is { } profile) request.Profile = profile;
        if (args.Has("--strict")) request.StrictText = true;
        if (args.Value("--id") is { } id) request.EntryId = id;
        if (request.EntryId.Length == 0) request.EntryId = args.Positional.Count == 1 ? Path.GetFileNameWithoutExtension(args.Positional[0]) : "entry";
        return request;
    }

    private static CheckEntryRequest ReadEntryFile(string path)
    {
        var text = ReadFile(path, "entry file");
        try
        {
            return JsonParser.Default.Parse<CheckEntryRequest>(text);
        }
        catch (InvalidProtocolBufferException error)
        {
            throw new UsageException($"entry file '{path}' is not a valid check request in the proto JSON mapping: {error.Message}");
        }
        catch (InvalidJsonException error)
        {
            throw new UsageException($"entry file '{path}' is not valid JSON: {error.Message}");
        }
    }

    internal static string ReadFile(string path, string what)
    {
        if (!File.Exists(path)) throw new UsageException($"{what} '{path}' does not exist");
        return File.ReadAllText(path);
    }
}
