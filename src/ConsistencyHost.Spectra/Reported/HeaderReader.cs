using ConsistencyHost.Spectra.Model;

namespace ConsistencyHost.Spectra.Reported;

/// <summary>What a spectrum header stated.</summary>
internal sealed record SpectrumHeader(int Offset, Nucleus Nucleus, string? Decoupled)
{
    public double? FrequencyMHz { get; set; }
    public string? Solvent { get; set; }
    public double? TemperatureK { get; set; }
    public List<string> Notes { get; } = [];
}

/// <summary>
/// Reads "1H NMR (400 MHz, CDCl3) δ", "13C{1H} NMR", "1H-NMR (CDCl3) δ:", "δH (400 MHz; CDCl3; Me4Si)",
/// "dH (CDCl3, 300 MHz)", "1H NMR (400 MHz, CDCl3, rotamers 6:4)".
/// </summary>
internal static class HeaderReader
{
    /// <summary>True when a header starts at the cursor (nothing is consumed).</summary>
    public static bool IsAt(TextCursor c) => TryNucleus(c, consume: false, out _, out _);

    public static SpectrumHeader Read(TextCursor c, ProblemSink sink)
    {
        var offset = c.Pos;
        TryNucleus(c, consume: true, out var nucleus, out var decoupled);
        var header = new SpectrumHeader(offset, nucleus, decoupled);
        c.SkipSpaces();
        c.TryChar(':');
        c.SkipSpaces();
        if (c.Current == '(') ReadParenthesis(c, header, sink);
        SkipDeltaToken(c);
        return header;
    }

    private static bool TryNucleus(TextCursor c, bool consume, out Nucleus nucleus, out string? decoupled)
    {
        var start = c.Pos;
        nucleus = Nucleus.Unknown;
        decoupled = null;
        if (start > 0 && char.IsLetterOrDigit(c.Text[start - 1])) return false;
        var ok = TryDeltaForm(c, out nucleus) || TryNmrForm(c, out nucleus, out decoupled);
        if (!consume || !ok) c.Pos = start;
        return ok;
    }

    /// <summary>"δH", "δC", "δF", "δP" followed by a blank, '(' or ':'; also "dH", "dC" where a PDF text layer lost the δ.</summary>
    /// <remarks>"dH (CDCl3, 300 MHz)" is how the RSC-style δH header reads after copying from many PDFs (published
    /// corpus rows si-001, si-039); a lone lower-case d before H/C/F/P and a blank is no other reading.</remarks>
    private static bool TryDeltaForm(TextCursor c, out Nucleus nucleus)
    {
        nucleus = Nucleus.Unknown;
        if (c.Current is not ('δ' or 'd')) return false;
        if (c.Current == 'd' && c.PeekAt(1) is not ('H' or 'C' or 'F' or 'P')) return false;
        nucleus = NucleusNames.Parse(c.PeekAt(1).ToString());
        var next = c.PeekAt(2);
        if (nucleus == Nucleus.Unknown || !(TextCursor.IsSpace(next) || next is '(' or ':')) return false;
        c.Pos += 2;
        return true;
    }

    /// <summary>"1H NMR", "¹H NMR", "1H-NMR", "13C{1H} NMR", "19F{¹H} NMR", "31P NMR".</summary>
    private static bool TryNmrForm(TextCursor c, out Nucleus nucleus, out string? decoupled)
    {
        nucleus = Nucleus.Unknown;
        decoupled = null;
        var i = c.Pos;
        var t = c.Text;
        while (i < t.Length && (TextCursor.IsDigit(t[i]) || IsSuperscriptDigit(t[i]))) i++;
        if (i >= t.Length || i == c.Pos || t[i] is not ('H' or 'C' or 'F' or 'P')) return false;
        var mass = string.Concat(t[c.Pos..i].Select(Normal));
        nucleus = NucleusNames.Parse(mass + t[i]);
        if (nucleus == Nucleus.Unknown || NucleusNames.ToLabel(nucleus) != mass + t[i]) return false;
        i++;
        if (i < t.Length && t[i] == '{')
        {
            var close = t.IndexOf('}', i);
            if (close < 0 || close - i > 8) return false;
            decoupled = string.Concat(t[(i + 1)..close].Select(Normal));
            i = close + 1;
        }
        while (i < t.Length && (TextCursor.IsSpace(t[i]) || t[i] == '-')) i++;
        if (string.Compare(t, i, "NMR", 0, 3, StringComparison.OrdinalIgnoreCase) != 0) return false;
        c.Pos = i + 3;
        return true;
    }

    private static bool IsSuperscriptDigit(char ch) => ch is '¹' or '²' or '³' or >= '⁰' and <= '⁹';

    private static char Normal(char ch) => ch switch
    {
        '¹' => '1', '²' => '2', '³' => '3', >= '⁰' and <= '⁹' => (char)('0' + (ch - '⁰')), _ => ch,
    };

    private static void ReadParenthesis(TextCursor c, SpectrumHeader header, ProblemSink sink)
    {
        var close = c.MatchingParen(c.Pos);
        if (close < 0)
        {
            sink.Add(c.Pos, c.Fragment(c.Pos), ReportedTextMessages.ExpectedHeaderClose);
            c.Pos = c.Text.Length;
            return;
        }
        var itemStart = c.Pos + 1;
        for (var i = itemStart; i <= close; i++)
        {
            if (i < close && c.Text[i] != ',' && c.Text[i] != ';') continue;
            HeaderItems.Apply(c, itemStart, i, header, sink);
            itemStart = i + 1;
        }
        c.Pos = close + 1;
    }

    /// <summary>Skips "δ", "δ:", "δ =", "d" (a lost δ), "delta", "δ (ppm)", "δ/ppm", "δH".</summary>
    private static void SkipDeltaToken(TextCursor c)
    {
        c.SkipSpaces();
        if (c.Current == ':') c.Pos++;
        var start = c.Pos;
        c.SkipSpaces();
        if (c.TryWord("delta") || c.TryChar('δ') || (c.Current == 'd' && !char.IsLetterOrDigit(c.PeekAt(1)) && c.TryChar('d')))
        {
            if (c.Current is 'H' or 'C' or 'F' or 'P' && !char.IsLetterOrDigit(c.PeekAt(1))) c.Pos++;
            c.SkipSpaces();
            if (c.TryWord("(ppm)", needBoundary: false) || c.TryWord("/ppm") || c.TryWord("ppm")) c.SkipSpaces();
        }
        else c.Pos = start;
        c.SkipSpaces();
        if (c.Current is ':' or '=') c.Pos++;
    }
}
