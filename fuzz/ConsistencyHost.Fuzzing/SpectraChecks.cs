using ConsistencyHost.Spectra;
using ConsistencyHost.Spectra.Jcamp;
using ConsistencyHost.Spectra.Model;
using ConsistencyHost.Spectra.Nmredata;
using ConsistencyHost.Spectra.Reported;

namespace ConsistencyHost.Fuzzing;

/// <summary>Harnesses for the spectrum readers: read, check positions, and format → re-read what was read.</summary>
internal static class SpectraChecks
{
    public static void Reported(string text)
    {
        foreach (var mode in (ReadMode[])[ReadMode.Strict, ReadMode.Lenient])
        {
            var result = ReportedTextReader.Read(text, mode);
            foreach (var p in result.Problems)
            {
                Invariant.Require(p.Offset >= 0 && p.Offset <= text.Length, $"problem offset {p.Offset} outside 0..{text.Length}: {p.Message}");
            }

            Invariant.Require(result.Succeeded || mode == ReadMode.Lenient || result.Spectra.Count == 0, "strict read with errors returned spectra");
            Reformat(result.Spectra);
        }
    }

    public static void Jcamp(string text)
    {
        var result = JcampReader.Read(text);
        foreach (var p in result.Problems)
        {
            Invariant.Require(p.Line >= 1 && p.Column >= 1, $"JCAMP problem at line {p.Line} column {p.Column}: {p.Message}");
        }

        Reformat(result.Spectra);
    }

    public static void Nmredata(string text)
    {
        var result = NmredataReader.Read(text);
        foreach (var p in result.Problems)
        {
            Invariant.Require(p.Line >= 1, $"NMReDATA problem at line {p.Line}: {p.Message}");
        }

        foreach (var record in result.Records)
        {
            Reformat(record.Spectra);
        }
    }

    /// <summary>A spectrum that was read can be formatted as journal text, and that text can be read again.</summary>
    private static void Reformat(IReadOnlyList<Spectrum> spectra)
    {
        if (spectra.Count == 0)
        {
            return;
        }

        var text = ReportedTextFormatter.Format(spectra);
        _ = ReportedTextReader.Read(text, ReadMode.Lenient);
    }
}
