using ConsistencyHost.Spectra;
using ConsistencyHost.Spectra.Model;
using ConsistencyHost.Spectra.Reported;

namespace ConsistencyHost.Engine.Intake;

/// <summary>
/// Reads reported characterisation text strictly: a fragment the reader cannot understand makes the entry
/// unusable (never a silently dropped peak), with the offset, the fragment and what was expected.
/// </summary>
internal static class ReportedTextIntake
{
    /// <summary>Reads a block that may hold several spectra and HRMS lines.</summary>
    public static ReportedTextResult Read(string text, string field)
    {
        var result = ReportedTextReader.Read(text, ReadMode.Strict);
        if (!result.Succeeded)
        {
            var errors = result.Problems.Where(p => p.Severity == ProblemSeverity.Error).Select(p => p.Message);
            throw new EntryInputException(field, string.Join(" ", errors));
        }

        if (result.Spectra.Count == 0 && result.Hrms.Count == 0)
        {
            throw new EntryInputException(field, "holds no NMR spectrum and no HRMS line; expected e.g. \"1H NMR (400 MHz, CDCl3) δ 7.26 (s, 1H)\"");
        }

        return result;
    }

    /// <summary>Reads the text of exactly one spectrum.</summary>
    public static Spectrum ReadOne(string text, string field)
    {
        var result = Read(text, field);
        return result.Spectra.Count == 1 && result.Hrms.Count == 0
            ? result.Spectra[0]
            : throw new EntryInputException(field, $"holds {result.Spectra.Count} spectra and {result.Hrms.Count} HRMS lines; expected exactly one spectrum here (use reported_text for whole blocks)");
    }
}
