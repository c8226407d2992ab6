using ConsistencyHost.Engine.Reports;
using ConsistencyHost.Sdk.Findings;
using ConsistencyHost.Spectra;
using ConsistencyHost.Spectra.Model;
using ConsistencyHost.Spectra.Reported;

namespace ConsistencyHost.Engine.Intake;

/// <summary>
/// Reads reported characterisation text. Strict: a fragment the reader cannot understand makes the entry
/// unusable. Lenient (the default): each such fragment becomes a <c>text-unreadable</c> warning with the offset,
/// the fragment and what was expected, and everything readable is checked. Never a silently dropped peak.
/// </summary>
internal static class ReportedTextIntake
{
    /// <summary>Rule id stamped on the findings intake itself reports.</summary>
    public const string RuleId = "reported-text";

    /// <summary>Version of those findings' wording and codes.</summary>
    public const string RuleVersion = "1.0.0";

    /// <summary>Code of a fragment that could not be read.</summary>
    public const string UnreadableCode = "text-unreadable";

    /// <summary>Code of the info finding listing non-NMR prose that was skipped.</summary>
    public const string SkippedCode = "text-skipped";

    /// <summary>Reads a block that may hold several spectra and HRMS lines.</summary>
    /// <param name="text">The pasted text.</param>
    /// <param name="field">The request field it came from, named in problems.</param>
    /// <param name="notes">Receives the findings of a lenient read; null reads strictly.</param>
    public static ReportedTextResult Read(string text, string field, List<ReportedFinding>? notes = null)
    {
        var result = ReportedTextReader.Read(text, notes is null ? ReadMode.Strict : ReadMode.Lenient);
        if (!result.Succeeded)
        {
            var errors = result.Problems.Where(p => p.Severity == ProblemSeverity.Error).Select(p => p.Message);
            throw new EntryInputException(field, string.Join(" ", errors));
        }

        if (result.Spectra.Count == 0 && result.Hrms.Count == 0 && result.Problems.Count == 0)
        {
            throw new EntryInputException(field, "holds no NMR spectrum and no HRMS line; expected e.g. \"1H NMR (400 MHz, CDCl3) δ 7.26 (s, 1H)\"");
        }

        notes?.AddRange(result.Problems.Select(p => Unreadable(p, field)));
        if (notes is not null && result.Skipped.Count > 0) notes.Add(Skipped(result.Skipped, field));
        return result;
    }

    /// <summary>Reads the text of exactly one spectrum.</summary>
    public static Spectrum ReadOne(string text, string field, List<ReportedFinding>? notes = null)
    {
        var result = Read(text, field, notes);
        return result.Spectra.Count == 1 && result.Hrms.Count == 0
            ? result.Spectra[0]
            : throw new EntryInputException(field, $"holds {result.Spectra.Count} spectra and {result.Hrms.Count} HRMS lines; expected exactly one spectrum here (use reported_text for whole blocks)");
    }

    private static ReportedFinding Unreadable(ReportedTextProblem problem, string field) =>
        new(RuleId, RuleVersion, new Finding(UnreadableCode, Severity.Warning, $"{field}: {problem.Message} The rest was read and checked.")
            .WithEvidence("field", field)
            .WithEvidence("offset", problem.Offset)
            .WithEvidence("fragment", problem.Fragment)
            .WithEvidence("expected", problem.Expected));

    private static ReportedFinding Skipped(IReadOnlyList<SkippedText> skipped, string field)
    {
        var list = string.Join("; ", skipped.Select(s => $"{s.Kind} at offset {s.Offset} ('{s.Fragment}')"));
        var finding = new Finding(SkippedCode, Severity.Info, $"{field}: skipped text that is not NMR or HRMS data: {list}.")
            .WithEvidence("field", field);
        foreach (var s in skipped) finding = finding.WithEvidence("skipped", $"{s.Kind}@{s.Offset}");
        return new(RuleId, RuleVersion, finding);
    }
}
