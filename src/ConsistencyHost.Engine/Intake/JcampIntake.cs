using ConsistencyHost.Spectra;
using ConsistencyHost.Spectra.Jcamp;
using ConsistencyHost.Spectra.Model;

namespace ConsistencyHost.Engine.Intake;

/// <summary>Reads a JCAMP-DX document holding exactly one NMR peak table.</summary>
internal static class JcampIntake
{
    public static Spectrum ReadOne(string text, string field)
    {
        var result = JcampReader.Read(text);
        if (!result.Succeeded)
        {
            var errors = result.Problems.Where(p => p.Severity == ProblemSeverity.Error).Select(p => p.Message);
            throw new EntryInputException(field, string.Join(" ", errors));
        }

        return result.Spectra.Count == 1
            ? result.Spectra[0]
            : throw new EntryInputException(field, $"holds {result.Spectra.Count} peak tables; expected exactly one NMR peak table per spectrum");
    }
}
