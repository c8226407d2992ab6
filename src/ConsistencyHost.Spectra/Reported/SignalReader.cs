using ConsistencyHost.Spectra.Model;

namespace ConsistencyHost.Spectra.Reported;

/// <summary>Reads one signal: a shift, a range or a rotamer pair ("4.33/4.22"), optional "ppm" and "*", optional
/// parenthesised details.</summary>
internal static class SignalReader
{
    public static SignalDraft? Read(TextCursor c, Nucleus nucleus, bool decimalComma, ProblemSink sink)
    {
        var draft = new SignalDraft(c.Pos, nucleus);
        if (!ReadPosition(c, draft, decimalComma, sink)) return null;
        var afterShift = c.Pos;
        c.SkipSpaces();
        if (c.TryWord("ppm")) c.SkipSpaces();
        if (c.TryChar('*')) draft.Notes.Add("*");
        c.SkipSpaces();
        if (c.Current != '(')
        {
            if (!draft.HasNotes) c.Pos = afterShift;
            return draft;
        }
        return ReadDetails(c, draft, decimalComma, sink) ? draft : null;
    }

    private static bool ReadPosition(TextCursor c, SignalDraft draft, bool decimalComma, ProblemSink sink)
    {
        if (!c.TryNumber(decimalComma, out var first, out var decimals))
        {
            sink.Add(c.Pos, c.Fragment(c.Pos), ReportedTextMessages.ExpectedShift);
            return false;
        }
        var mixed = decimalComma && c.Text.AsSpan(draft.Offset, c.Pos - draft.Offset).Contains('.');
        if (mixed || (!decimalComma && decimals == 0 && c.Current == ',' && TextCursor.IsDigit(c.PeekAt(1))))
        {
            sink.Add(draft.Offset, c.Fragment(draft.Offset), ReportedTextMessages.ExpectedUnambiguousDecimal);
            return false;
        }
        if (c.Current == '/' && TextCursor.IsDigit(c.PeekAt(1))) return ReadRotamerPair(c, draft, first, decimalComma);
        var beforeDash = c.Pos;
        c.SkipSpaces();
        if (!TextCursor.IsDash(c.Current))
        {
            c.Pos = beforeDash;
            draft.Shift = first;
            return true;
        }
        c.Pos++;
        c.SkipSpaces();
        if (!c.TryNumber(decimalComma, out var second, out _))
        {
            sink.Add(c.Pos, c.Fragment(c.Pos), ReportedTextMessages.ExpectedRangeEnd);
            return false;
        }
        draft.Low = Math.Min(first, second);
        draft.High = Math.Max(first, second);
        return true;
    }

    /// <summary>
    /// "4.33/4.22 (s, 2H)": one environment at two shifts, one per rotamer (common practice). Read as one signal at
    /// the first shift written, with both kept in a note; never as a range (a range has a width to check).
    /// </summary>
    private static bool ReadRotamerPair(TextCursor c, SignalDraft draft, double first, bool decimalComma)
    {
        c.Pos++;
        c.TryNumber(decimalComma, out _, out _);
        draft.Shift = first;
        draft.Notes.Add("rotamers " + c.Text[draft.Offset..c.Pos]);
        return true;
    }

    private static bool ReadDetails(TextCursor c, SignalDraft draft, bool decimalComma, ProblemSink sink)
    {
        var open = c.Pos;
        var close = c.MatchingParen(open);
        if (close < 0)
        {
            sink.Add(open, c.Fragment(open), ReportedTextMessages.ExpectedDetailsClose);
            return false;
        }
        DetailsReader.Read(DetailItem.Split(c.Text, open + 1, close, decimalComma), draft, decimalComma, sink);
        draft.HasDetails = true;
        c.Pos = close + 1;
        return true;
    }
}
