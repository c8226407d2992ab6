namespace ConsistencyHost.Spectra.Reported;

/// <summary>A count written before or after a label or pattern: "2 × CH3", "2×CH", "2 x dd", "CH × 2".</summary>
internal static class Multiplier
{
    /// <summary>Splits "2 × dd" / "2×CH" / "2 x OMe" into 2 and the rest; false when no such count leads.</summary>
    public static bool TrySplitLeading(string text, out int count, out string rest)
    {
        count = 0;
        rest = text;
        var i = 0;
        while (i < text.Length && char.IsAsciiDigit(text[i])) i++;
        if (i == 0 || i > 3) return false;
        var j = i;
        while (j < text.Length && text[j] == ' ') j++;
        if (j >= text.Length || text[j] is not ('×' or 'x')) return false;
        j++;
        while (j < text.Length && text[j] == ' ') j++;
        if (j >= text.Length) return false;
        count = int.Parse(text.AsSpan(0, i), provider: System.Globalization.CultureInfo.InvariantCulture);
        rest = text[j..];
        return true;
    }

    /// <summary>Splits "CH × 2" / "CH x 2" into 2 and "CH"; false when no such count trails.</summary>
    public static bool TrySplitTrailing(string text, out int count, out string rest)
    {
        count = 0;
        rest = text;
        var i = text.Length;
        while (i > 0 && char.IsAsciiDigit(text[i - 1])) i--;
        if (i == text.Length || text.Length - i > 3) return false;
        var j = i;
        while (j > 0 && text[j - 1] == ' ') j--;
        if (j == 0 || text[j - 1] is not ('×' or 'x') || j == i) return false;
        var head = text[..(j - 1)].TrimEnd();
        if (head.Length == 0 || head.Length == j - 1) return false;
        count = int.Parse(text.AsSpan(i), provider: System.Globalization.CultureInfo.InvariantCulture);
        rest = head;
        return true;
    }
}
