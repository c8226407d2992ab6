using ConsistencyHost.Spectra.Model;

namespace ConsistencyHost.Spectra.Reported;

/// <summary>
/// Reads journal-style NMR text ("1H NMR (400 MHz, CDCl3) δ 7.31–7.24 (m, 5H), 4.12 (q, J = 7.1 Hz, 2H) …",
/// 13C, 19F, 31P lists, HRMS lines) into spectra and HRMS claims, with every problem located by offset.
/// </summary>
/// <remarks>
/// A hand-written single-pass scanner (no regular expressions, no backtracking beyond one token).
/// Accepted variants follow the ACS guideline form, the Acta Chim. Slov. style page, the older RSC form and
/// published PMC tables; docs/spectra.md lists them with their sources.
/// </remarks>
public static class ReportedTextReader
{
    /// <summary>Reads <paramref name="text"/> with the default limits.</summary>
    public static ReportedTextResult Read(string text, ReadMode mode = ReadMode.Strict) =>
        Read(text, mode, ReportedTextOptions.Default);

    /// <summary>Reads <paramref name="text"/> with the given limits.</summary>
    public static ReportedTextResult Read(string text, ReadMode mode, ReportedTextOptions options)
    {
        ArgumentNullException.ThrowIfNull(text);
        ArgumentNullException.ThrowIfNull(options);
        var sink = new ProblemSink(mode);
        if (text.Length > options.MaxTextLength)
        {
            var message = ReportedTextMessages.TextTooLong(text.Length, options.MaxTextLength);
            sink.AddLimit(options.MaxTextLength, "", ReportedTextMessages.ExpectedShorterText, message);
            return new ReportedTextResult { Problems = sink.Problems };
        }
        var spectra = new List<Spectrum>();
        var hrms = new List<HrmsClaim>();
        ReadAll(new TextCursor(text), sink, options, spectra, hrms);
        // A clean report (the usual case) skips the LINQ over its empty problem list.
        var clean = sink.Count == 0;
        var failed = !clean && mode == ReadMode.Strict && sink.Problems.Any(p => p.Severity == ProblemSeverity.Error);
        return new ReportedTextResult
        {
            Spectra = failed ? [] : spectra,
            Hrms = failed ? [] : hrms,
            Problems = clean ? [] : [.. sink.Problems.OrderBy(p => p.Offset)],
            Skipped = sink.Skipped,
        };
    }

    private static void ReadAll(TextCursor c, ProblemSink sink, ReportedTextOptions options,
        List<Spectrum> spectra, List<HrmsClaim> hrms)
    {
        while (true)
        {
            SkipBetweenSections(c);
            if (c.AtEnd) return;
            if (HrmsReader.IsAt(c))
            {
                if (HrmsReader.Read(c, sink) is { } claim) hrms.Add(claim);
            }
            else if (HeaderReader.IsAt(c))
            {
                var before = sink.Count;
                spectra.Add(SignalListReader.Read(c, HeaderReader.Read(c, sink), sink, options, before));
            }
            else if (spectra.Count > 0 && ListNotes.TryReadClause(c) is { } note)
                spectra[^1] = spectra[^1] with { Notes = [.. spectra[^1].Notes, note] };
            else
                SkipUnknown(c, sink);
        }
    }

    private static void SkipBetweenSections(TextCursor c)
    {
        while (!c.AtEnd && (TextCursor.IsSpace(c.Current) || c.Current is ';' or ',' or '.')) c.Pos++;
    }

    /// <summary>Reports text that is neither a header nor an HRMS line, and skips to the next one.</summary>
    private static void SkipUnknown(TextCursor c, ProblemSink sink)
    {
        var start = c.Pos;
        c.Pos++;
        while (!c.AtEnd && !(HeaderReader.IsAt(c) || HrmsReader.IsAt(c))) c.Pos++;
        if (sink.Mode == ReadMode.Strict || ProseClauses.KindAt(c.Text, start) is null)
        {
            sink.Add(start, c.Fragment(start, c.Pos), ReportedTextMessages.ExpectedHeader);
            return;
        }

        // Lenient, and the text opens with prose such as "Rf 0.32 (…); mp 120 °C": each known clause is skipped
        // with a note, any other clause is still a problem.
        ProseClauses.Split(c.Text, start, c.Pos, (from, to) =>
        {
            if (ProseClauses.KindAt(c.Text, from) is { } kind) sink.Skipped.Add(new(from, kind, c.Fragment(from, to)));
            else sink.Add(from, c.Fragment(from, to), ReportedTextMessages.ExpectedHeader);
        });
    }
}
