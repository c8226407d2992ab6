using ConsistencyHost.Spectra;
using ConsistencyHost.Spectra.Nmredata;

namespace ConsistencyHost.Engine.Intake;

/// <summary>Reads NMReDATA SD records strictly: any error makes the input unusable, with its line.</summary>
internal static class NmredataIntake
{
    public static IReadOnlyList<NmredataRecord> ReadAll(string text, string field)
    {
        var result = NmredataReader.Read(text);
        if (!result.Succeeded)
        {
            throw new EntryInputException(field, string.Join(" ", result.Problems.Where(p => p.Severity == ProblemSeverity.Error).Select(p => p.Message)));
        }

        return result.Records.Count > 0 ? result.Records : throw new EntryInputException(field, "holds no SD record; expected a molfile block followed by NMREDATA_ tags and $$$$");
    }

    public static NmredataRecord ReadOne(string text, string field)
    {
        var records = ReadAll(text, field);
        return records.Count == 1
            ? records[0]
            : throw new EntryInputException(field, $"holds {records.Count} records; one entry takes exactly one NMReDATA record");
    }
}
