using ConsistencyHost.Spectra.Model;

namespace ConsistencyHost.Spectra.Reported;

/// <summary>
/// Interprets the items of a signal's details in any order: "(dd, J = 8.0, 2.0 Hz, 1H, H-3)", "(2H, m, CH2)",
/// "(1H, d, J 8.2 Hz, ArH)", "(d, 9.6 Hz, 1 H)", "(3H, d, 6.7)", "(2C)", "(d, J = 245.3 Hz)", "(br s, 1H, exchangeable with D2O)",
/// "(2 × dd, J = 8.0, 2.0 Hz, 1H)", and in 13C lists the DEPT/APT labels "(CH)", "(2×CH)".
/// </summary>
internal static class DetailsReader
{
    public static void Read(List<DetailItem> items, SignalDraft draft, bool decimalComma, ProblemSink sink)
    {
        var afterCoupling = false;
        foreach (var item in items)
            afterCoupling = ReadItem(item, draft, decimalComma, sink, afterCoupling);
    }

    /// <summary>Reads one item; returns true when a following bare number continues a J list.</summary>
    private static bool ReadItem(DetailItem item, SignalDraft draft, bool decimalComma, ProblemSink sink, bool afterCoupling)
    {
        var text = item.Text;
        if (text.Length == 0)
        {
            sink.Add(item.Offset, ",", ReportedTextMessages.ExpectedDetail);
            return false;
        }
        if (CouplingReader.LooksLikeJ(text))
        {
            CouplingReader.ReadJ(item, draft.Nucleus, decimalComma, sink, draft.Couplings);
            return true;
        }
        if (TryCount(item, draft, sink)) return false;
        if (TryRepeatedMultiplicity(item, draft, decimalComma, sink)) return true;
        if (StartsWithNumber(text) && !Assignments.IsAssignment(text)) return ReadBareCoupling(item, draft, decimalComma, sink, afterCoupling);
        // Before the multiplicities: in a 13C list "(C)" is a DEPT label, not "c" (complex).
        if (draft.Nucleus == Nucleus.C13 && DeptLabels.TryRead(text, out var carbons))
        {
            if (carbons > 1) SetCarbonCount(item, draft, carbons, sink);
            draft.Assignments.Add(text);
            return false;
        }
        if (TryMultiplicity(item, draft, decimalComma, sink)) return true;
        if (SignalNotes.IsNote(text))
        {
            draft.Notes.Add(text);
            return false;
        }
        if (Assignments.IsAssignment(text))
        {
            draft.Assignments.Add(text);
            return false;
        }
        sink.Add(item.Offset, Clip(text), ReportedTextMessages.ExpectedDetail);
        return false;
    }

    private static bool StartsWithNumber(string text) => char.IsAsciiDigit(text[0]) || (text.Length > 1 && text[0] == '-');

    private static bool ReadBareCoupling(DetailItem item, SignalDraft draft, bool decimalComma, ProblemSink sink, bool afterCoupling)
    {
        if (!afterCoupling && draft.Multiplicity is null)
        {
            sink.Add(item.Offset, Clip(item.Text), ReportedTextMessages.ExpectedCouplingContext);
            return false;
        }
        if (!draft.HasCouplings && draft.Multiplicity is { } multiplicity && HasNoSplitting(multiplicity)
            && !item.Text.Contains("Hz", StringComparison.Ordinal))
        {
            // "(s, 3)" or "(m, 5)": a singlet has no J and a bare m names none, so a number without "Hz" is most likely
            // an integral written without its H; reading it as J = 3 Hz would be a silent misreading.
            sink.Add(item.Offset, Clip(item.Text), ReportedTextMessages.ExpectedCountWithNucleus);
            return false;
        }
        CouplingReader.ReadBare(item, draft.Nucleus, decimalComma, sink, draft.Couplings);
        return true;
    }

    private static bool HasNoSplitting(string multiplicity)
    {
        var pattern = Multiplicity.Parse(multiplicity);
        return pattern.IsSinglet || (pattern.IsMultiplet && pattern.Components.Count == 0 && pattern.SecondOrderLabel is null);
    }

    /// <summary>"2H", "2 H", "0.5H", "2C", "3F", "1P".</summary>
    private static bool TryCount(DetailItem item, SignalDraft draft, ProblemSink sink)
    {
        if (!char.IsAsciiDigit(item.Text[0]) || item.Text[^1] is not ('H' or 'C' or 'F' or 'P')) return false;
        var c = new TextCursor(item.Text);
        if (!c.TryNumber(false, out var value, out var decimals)) return false;
        c.SkipSpaces();
        if (c.Pos != item.Text.Length - 1) return false;
        var letter = item.Text[^1];
        if (letter is not ('H' or 'C' or 'F' or 'P')) return false;
        if (draft.HasCount)
        {
            sink.Add(item.Offset, Clip(item.Text), ReportedTextMessages.ExpectedOneCount);
            return true;
        }
        if (letter == 'H') draft.ProtonCount = value;
        else if (decimals > 0) return false;
        else if (letter == 'C') draft.CarbonCount = (int)value;
        else draft.NucleusCount = (int)value;
        return true;
    }

    /// <summary>"(2C, 2×CH)" agrees with itself; a second, different count is a problem.</summary>
    private static void SetCarbonCount(DetailItem item, SignalDraft draft, int carbons, ProblemSink sink)
    {
        if (draft.CarbonCount is null && !draft.HasCount) draft.CarbonCount = carbons;
        else if (draft.CarbonCount != carbons) sink.Add(item.Offset, Clip(item.Text), ReportedTextMessages.ExpectedOneCount);
    }

    /// <summary>
    /// "2 × dd": the pattern seen twice (common practice). In 1H lists, once per rotamer or for two overlapping
    /// signals: read as dd with the item kept as a note. In 13C lists ("129.3 (2 × d)", off-resonance or C–F
    /// patterns), two carbons with that pattern.
    /// </summary>
    private static bool TryRepeatedMultiplicity(DetailItem item, SignalDraft draft, bool decimalComma, ProblemSink sink)
    {
        if (!Multiplier.TrySplitLeading(item.Text, out var times, out var single) || !Model.Multiplicity.TryParse(single, out var pattern) || times < 2)
            return false;
        // "(dd, …, 2 × dd)" as the formatter writes the note back: the pattern is already there.
        if (draft.Multiplicity is null || !Model.Multiplicity.Parse(draft.Multiplicity).Equals(pattern))
            TryMultiplicity(new DetailItem(item.Offset + item.Text.Length - single.Length, single), draft, decimalComma, sink);
        if (draft.Nucleus == Nucleus.C13) SetCarbonCount(item, draft, times, sink);
        else draft.Notes.Add(item.Text);
        return true;
    }

    /// <summary>"dd", "br s", "app t", "ABq", "overlapped", and the table form "d (8.5)" / "dd (8.0, 1.5)".</summary>
    private static bool TryMultiplicity(DetailItem item, SignalDraft draft, bool decimalComma, ProblemSink sink)
    {
        var text = item.Text;
        var open = text.IndexOf('(');
        var head = open > 0 && text[^1] == ')' && StartsWithNumber(text[(open + 1)..].TrimStart() + " ")
            ? text[..open].TrimEnd() : text;
        if (!Model.Multiplicity.TryParse(head, out var parsed)) return false;
        if (draft.Multiplicity is not null)
        {
            if (SignalNotes.IsNote(text)) return false;
            sink.Add(item.Offset, Clip(text), ReportedTextMessages.ExpectedOneMultiplicity);
            return true;
        }
        draft.Multiplicity = head;
        if (!ReferenceEquals(head, text))
        {
            foreach (var value in DetailItem.Split(item.Text, open + 1, text.Length - 1, decimalComma))
                CouplingReader.ReadBare(value with { Offset = item.Offset + value.Offset }, draft.Nucleus, decimalComma, sink, draft.Couplings);
        }
        return true;
    }

    public static string Clip(string text) => text.Length > 30 ? text[..30] : text;
}
