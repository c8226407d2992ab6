using ConsistencyHost.Spectra;
using ConsistencyHost.Spectra.Jcamp;
using ConsistencyHost.Spectra.Model;
using ConsistencyHost.Spectra.Reported;

namespace ConsistencyHost.Engine.Intake;

/// <summary>
/// The strict text readers intake uses, for callers outside the engine (the CLI's peaks command): each
/// throws <see cref="EntryInputException"/> naming the field, the position and what was expected.
/// </summary>
public static class EntryTextReaders
{
    /// <summary>Reads a characterisation block (NMR lines and HRMS lines).</summary>
    public static ReportedTextResult ReadReportedText(string text, string field) => ReportedTextIntake.Read(text, field);

    /// <summary>
    /// Reads a characterisation block leniently: each unreadable fragment and each skipped prose clause is passed
    /// to <paramref name="note"/> as one sentence ("warning text-unreadable: …"), and everything readable is returned.
    /// </summary>
    public static ReportedTextResult ReadReportedTextLeniently(string text, string field, Action<string> note)
    {
        var notes = new List<Reports.ReportedFinding>();
        var result = ReportedTextIntake.Read(text, field, notes);
        foreach (var n in notes)
        {
            note($"{n.Finding.Severity.ToString().ToLowerInvariant()} {n.Finding.Code}: {n.Finding.Message}");
        }

        return result;
    }

    /// <summary>Reads every NMR peak table of a JCAMP-DX document.</summary>
    public static IReadOnlyList<Spectrum> ReadJcamp(string text, string field)
    {
        var result = JcampReader.Read(text);
        if (!result.Succeeded)
        {
            throw new EntryInputException(field, string.Join(" ", result.Problems.Where(p => p.Severity == ProblemSeverity.Error).Select(p => p.Message)));
        }

        return result.Spectra.Count > 0 ? result.Spectra : throw new EntryInputException(field, "holds no NMR peak table; expected a block with ##PEAK TABLE= or ##PEAKTABLE=");
    }

    /// <summary>Reads the spectra of every record of an NMReDATA SD file.</summary>
    public static IReadOnlyList<Spectrum> ReadNmredataSpectra(string text, string field) =>
        [.. NmredataIntake.ReadAll(text, field).SelectMany(r => r.Spectra)];
}
