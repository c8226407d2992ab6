namespace ConsistencyHost.Spectra.Reported;

/// <summary>Recognises assignment labels ("H-3", "ArH", "OCH3", "4×CH2", "H-1 and H-2", "C=O", "H-1'"):
/// one token, or tokens joined by "and", "&amp;" or "+".</summary>
/// <remarks>Common practice: an assignment names atoms, so it carries a capital element letter; a lower-case
/// word alone ("dx", "brd") is a typo to report, not a label.</remarks>
internal static class Assignments
{
    public static bool IsAssignment(string text)
    {
        text = WithoutMultiplier(text);
        if (!text.Contains(" and ") && !text.Contains(" & ") && !text.Contains(" + ")) return IsLabel(text);
        var parts = text.Split([" and ", " & ", " + "], StringSplitOptions.None);
        return parts.All(IsLabel);
    }

    /// <summary>"2 × CH3", "2 x OMe", "4×CH2" → the label after the multiplier ("4×CH2" stays as it is).</summary>
    private static string WithoutMultiplier(string text)
    {
        var i = 0;
        while (i < text.Length && char.IsAsciiDigit(text[i])) i++;
        if (i == 0 || i >= text.Length || text[i] != ' ') return text;
        while (i < text.Length && text[i] == ' ') i++;
        if (i >= text.Length || text[i] is not ('×' or 'x')) return text;
        i++;
        while (i < text.Length && text[i] == ' ') i++;
        return i < text.Length ? text[i..] : text;
    }

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
            or ')' or '[' or ']' or '.' or '*' or 'α' or 'β' or 'γ' or 'δ' or '₂' or '₃' or '–' or '&' or '#';
}
