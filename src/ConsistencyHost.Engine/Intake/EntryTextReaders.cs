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
