using System.Globalization;
using System.Runtime.CompilerServices;

namespace ConsistencyHost.Spectra.Reported;

/// <summary>A position in the text with the small scanning steps every reader needs (no regular expressions).</summary>
/// <remarks>Fields and local copies rather than properties in the loops: every character of a report passes here.</remarks>
internal sealed class TextCursor(string text)
{
    public readonly string Text = text;
    public int Pos;
    public bool AtEnd => Pos >= Text.Length;
    public char Current => (uint)Pos < (uint)Text.Length ? Text[Pos] : '\0';
    public char PeekAt(int offset) => Pos + offset < Text.Length && Pos + offset >= 0 ? Text[Pos + offset] : '\0';

    public void SkipSpaces()
    {
        var t = Text;
        var i = Pos;
        while (i < t.Length && IsSpace(t[i])) i++;
        Pos = i;
    }

    public void SkipSpacesOnLine()
    {
        var t = Text;
        var i = Pos;
        while (i < t.Length && t[i] is ' ' or '\t' or '\u00A0') i++;
        Pos = i;
    }

    [MethodImpl(MethodImplOptions.AggressiveInlining)]
    public static bool IsSpace(char c) => c is ' ' or '\t' or '\r' or '\n' or '\u00A0' or '\u2009' or '\u202F';
    public static bool IsDash(char c) => c is '-' or '–' or '—' or '‒' or '−';
    [MethodImpl(MethodImplOptions.AggressiveInlining)]
    public static bool IsDigit(char c) => (uint)(c - '0') <= 9;

    /// <summary>True (and advances) when <paramref name="word"/> follows, case-insensitively.</summary>
    public bool TryWord(string word, bool needBoundary = true)
    {
        if (string.Compare(Text, Pos, word, 0, word.Length, StringComparison.OrdinalIgnoreCase) != 0) return false;
        if (Pos + word.Length > Text.Length) return false;
        if (needBoundary && char.IsLetterOrDigit(PeekAt(word.Length))) return false;
        Pos += word.Length;
        return true;
    }

    public bool TryChar(char c)
    {
        if (Current != c) return false;
        Pos++;
        return true;
    }

    /// <summary>Reads a number: optional sign, digits, optional fraction ('.' or, when allowed, ',').</summary>
    public bool TryNumber(bool decimalComma, out double value, out int decimals)
    {
        value = 0;
        decimals = 0;
        var t = Text;
        var start = Pos;
        var i = Pos;
        var negative = i < t.Length && (t[i] == '-' || t[i] == '−');
        if (negative) i++;
        var digitsStart = i;
        while (i < t.Length && IsDigit(t[i])) i++;
        if (i == digitsStart) return false;
        var intEnd = i;
        if (i + 1 < t.Length && (t[i] == '.' || (decimalComma && t[i] == ',')) && IsDigit(t[i + 1]))
        {
            i++;
            while (i < t.Length && IsDigit(t[i])) i++;
            decimals = i - intEnd - 1;
        }
        value = Decimal(t.AsSpan(digitsStart, i - digitsStart));
        if (negative) value = -value;
        Pos = i;
        return i > start;
    }

    private static readonly double[] PowersOfTen = [1, 1e1, 1e2, 1e3, 1e4, 1e5, 1e6, 1e7, 1e8, 1e9, 1e10, 1e11, 1e12, 1e13, 1e14, 1e15];

    /// <summary>
    /// Digits with at most one '.' or ',' as a double. Up to 15 significant digits this is one correctly rounded
    /// division of two exact doubles, so it equals double.Parse; longer numbers fall back to double.Parse.
    /// </summary>
    private static double Decimal(ReadOnlySpan<char> digits)
    {
        long mantissa = 0;
        var decimals = 0;
        var significant = 0;
        var seenPoint = false;
        foreach (var ch in digits)
        {
            if (ch is '.' or ',')
            {
                seenPoint = true;
                continue;
            }
            mantissa = mantissa * 10 + (ch - '0');
            if (mantissa > 0) significant++;
            if (seenPoint) decimals++;
        }
        if (significant <= 15 && decimals < PowersOfTen.Length) return mantissa / PowersOfTen[decimals];
        return double.Parse(digits.ToString().Replace(',', '.'), NumberStyles.AllowDecimalPoint, CultureInfo.InvariantCulture);
    }

    /// <summary>Up to 30 characters from <paramref name="from"/>, stopping at a line end.</summary>
    public string Fragment(int from, int to = -1)
    {
        if (from >= Text.Length) return "";
        var end = to < 0 ? Math.Min(Text.Length, from + 30) : Math.Min(to, from + 30);
        var newline = Text.IndexOfAny(['\r', '\n'], from, end - from);
        if (newline == from) newline = -1;
        return Text[from..(newline > from ? newline : end)].TrimEnd();
    }

    /// <summary>Index of the ')' matching the '(' at <paramref name="open"/>, or -1.</summary>
    public int MatchingParen(int open)
    {
        var depth = 0;
        for (var i = open; i < Text.Length; i++)
        {
            if (Text[i] == '(') depth++;
            else if (Text[i] == ')' && --depth == 0) return i;
        }
        return -1;
    }
}
