using ConsistencyHost.Spectra.Model;

namespace ConsistencyHost.Spectra.Reported;

/// <summary>Reads the signal list after a header, up to a closing '.', the next header or the end.</summary>
internal static class SignalListReader
{
    // problemsBefore: the problem count before the header, because a broken header already explains an empty list.
    public static Spectrum Read(TextCursor c, SpectrumHeader header, ProblemSink sink, ReportedTextOptions options, int problemsBefore)
    {
        var decimalComma = UsesDecimalComma(c);
        var signals = new List<Signal>();
        var notes = header.Notes;
        while (true)
        {
            c.SkipSpaces();
            if (c.AtEnd || HeaderReader.IsAt(c) || HrmsReader.IsAt(c)) break;
            if (c.TryWord("ppm")) continue;
            // "…, 7.33 (s, 3H), and 7.35 (s, 2H)": "and" before the last signal (common practice).
            if (signals.Count > 0 && c.Current == 'a' && c.TryWord("and")) continue;
            if (!TextCursor.IsDigit(c.Current) && ReadNote(c, signals, notes) is { } over)
            {
                if (over) break;
                continue;
            }
            if (signals.Count >= options.MaxSignalsPerSpectrum)
            {
                sink.AddLimit(c.Pos, c.Fragment(c.Pos), ReportedTextMessages.ExpectedFewerSignals,
                    ReportedTextMessages.TooManySignals(c.Pos, options.MaxSignalsPerSpectrum));
                SkipList(c);
                break;
            }
            if (ReadOne(c, header.Nucleus, decimalComma, sink) is not { } signal)
            {
                if (ListEnd.SkipPastFault(c)) break;
                continue;
            }
            signals.Add(signal);
            if (EndsAfterSignal(c, sink)) break;
        }
        if (signals.Count == 0 && sink.Count == problemsBefore)
            sink.Add(c.Pos, c.Fragment(c.Pos), ReportedTextMessages.ExpectedSignals);
        return new Spectrum
        {
            Nucleus = header.Nucleus,
            FrequencyMHz = header.FrequencyMHz,
            Solvent = header.Solvent,
            TemperatureK = header.TemperatureK,
            Decoupled = header.Decoupled,
            SourceOffset = header.Offset,
            Signals = signals,
            Notes = notes.Count == 0 ? [] : notes,
        };
    }

    /// <summary>
    /// A note where a signal was due: a bracketed one belongs to the signal before it, a clause to the spectrum.
    /// Null when there is no note; otherwise true when the list is over.
    /// </summary>
    private static bool? ReadNote(TextCursor c, List<Signal> signals, List<string> notes)
    {
        if (signals.Count > 0 && ListNotes.TryReadBracketed(c) is { } bracketed)
        {
            signals[^1] = signals[^1] with { Notes = [.. signals[^1].Notes, bracketed] };
            return EndsAfterNote(c);
        }
        if (ListNotes.TryReadClause(c) is not { } clause) return null;
        notes.Add(clause);
        return EndsAfterNote(c);
    }

    private static bool EndsAfterNote(TextCursor c)
    {
        c.SkipSpaces();
        if (c.Current is ',' or ';')
        {
            c.Pos++;
            return false;
        }
        if (c.Current == '.') c.Pos++;
        return true;
    }

    private static Signal? ReadOne(TextCursor c, Nucleus nucleus, bool decimalComma, ProblemSink sink)
    {
        var draft = SignalReader.Read(c, nucleus, decimalComma, sink);
        if (draft is null) return null;
        c.SkipSpacesOnLine();
        InlineDetails.TryRead(c, draft, decimalComma, sink);
        var afterDetails = c.Pos;
        c.SkipSpaces();
        if (ListNotes.TryReadBracketed(c) is { } note) draft.Notes.Add(note);
        else c.Pos = afterDetails;
        return draft.Build();
    }

    /// <summary>Consumes the separator after a signal; true when the list is over.</summary>
    private static bool EndsAfterSignal(TextCursor c, ProblemSink sink)
    {
        c.SkipSpaces();
        if (c.TryWord("ppm")) c.SkipSpaces();
        if (c.Current is ',' or ';')
        {
            c.Pos++;
            return false;
        }
        if (c.Current == 'a' && c.TryWord("and")) return false;
        if (c.Current == '.' && ListEnd.IsTerminator(c.Text, c.Pos))
        {
            c.Pos++;
            return true;
        }
        if (c.AtEnd || HeaderReader.IsAt(c) || HrmsReader.IsAt(c)) return true;
        sink.Add(c.Pos, c.Fragment(c.Pos), ReportedTextMessages.ExpectedSeparator);
        return ListEnd.SkipPastFault(c);
    }

    private static void SkipList(TextCursor c)
    {
        while (!ListEnd.SkipPastFault(c)) { }
    }

    /// <summary>A list uses decimal commas when its first shift is written "7,26" (digits, comma, digit).</summary>
    private static bool UsesDecimalComma(TextCursor c)
    {
        var i = c.Pos;
        var t = c.Text;
        while (i < t.Length && TextCursor.IsSpace(t[i])) i++;
        if (i < t.Length && t[i] is '-' or '−') i++;
        var digits = i;
        while (i < t.Length && TextCursor.IsDigit(t[i])) i++;
        return i > digits && i + 1 < t.Length && t[i] == ',' && TextCursor.IsDigit(t[i + 1]);
    }
}
