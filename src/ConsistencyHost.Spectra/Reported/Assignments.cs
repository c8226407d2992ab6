namespace ConsistencyHost.Spectra.Reported;

/// <summary>Recognises assignment labels ("H-3", "ArH", "OCH3", "4×CH2", "H-1 and H-2", "C=O", "H-1'", "aromatic CH",
/// "arom."): one token, or tokens joined by "and", "&amp;" or "+".</summary>
/// <remarks>Common practice: an assignment names atoms, so it carries a capital element letter; a lower-case
/// word alone ("dx", "brd") is a typo to report, not a label.</remarks>
internal static class Assignments
{
    // Common practice: a region named in words, alone or before a label ("arom.", "aromatic CH", "olefinic H").
    private static readonly string[] Regions =
        ["aromatic", "arom.", "arom", "olefinic", "olefin.", "vinylic", "aliphatic", "aliph.", "benzylic", "allylic"];

    public static bool IsAssignment(string text)
    {
        text = WithoutMultiplier(text);
        if (!text.Contains(" and ") && !text.Contains(" & ") && !text.Contains(" + ")) return IsLabelOrRegion(text);
        var parts = text.Split([" and ", " & ", " + "], StringSplitOptions.None);
        return parts.All(IsLabelOrRegion);
    }

    private static bool IsLabelOrRegion(string text)
    {
        if (text.Length == 0 || !char.IsAsciiLetterLower(text[0])) return IsLabel(text);
        foreach (var region in Regions)
        {
            if (!text.StartsWith(region, StringComparison.Ordinal)) continue;
            if (text.Length == region.Length) return true;
            if (text[region.Length] == ' ') return IsLabel(text[(region.Length + 1)..].TrimStart());
        }
        return IsLabel(text);
    }

    /// <summary>"2 × CH3", "2 x OMe", "4×CH2" → the label after the multiplier.</summary>
    private static string WithoutMultiplier(string text) => Multiplier.TrySplitLeading(text, out _, out var rest) ? rest : text;

    private static bool IsLabel(string text)
    {
        if (text.Length == 0) return false;
        var i = 0;
        while (i < text.Length && char.IsAsciiDigit(text[i])) i++;
        if (i > 0 && (i >= text.Length || text[i] is not ('×' or 'x' or '*'))) return false;
        var hasCapital = false;
        foreach (var ch in text)
        {
            if (char.IsAsciiLetterUpper(ch)) hasCapital = true;
            else if (!IsLabelChar(ch)) return false;
        }
        return hasCapital;
    }

    private static bool IsLabelChar(char ch) =>
        char.IsAsciiLetterOrDigit(ch) || ch is '-' or '\'' or '′' or '″' or '"' or '=' or '×' or '/' or '+' or '('
            or ')' or '[' or ']' or '.' or '*' or 'α' or 'β' or 'γ' or 'δ' or '₂' or '₃' or '–' or '−' or '&' or '#';
}
