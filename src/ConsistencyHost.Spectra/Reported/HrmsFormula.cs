using System.Text;

namespace ConsistencyHost.Spectra.Reported;

/// <summary>
/// The ion formula of an HRMS line: "C10H14NO2", "C12H15NO3Na", "C8H11N4O2+", subscript and superscript digits
/// "C₈H₁₁N₄O₂⁺", and the bracketed ion formula "[C9H12NO2]+" (common practice). Returned with plain digits and
/// charges ("C8H11N4O2+", "C9H12NO2+") so the mass check reads every spelling alike.
/// </summary>
internal static class HrmsFormula
{
    /// <summary>Reads a formula at the cursor; "" (cursor unchanged) when none starts there.</summary>
    public static string Read(TextCursor c)
    {
        var start = c.Pos;
        var bracketed = c.TryChar('[');
        var first = c.Pos;
        while (char.IsAsciiLetterOrDigit(c.Current) || IsSubscript(c.Current) || (!bracketed && c.Current is '(' or ')')) c.Pos++;
        var body = c.Text[first..c.Pos];
        if (bracketed && !c.TryChar(']')) body = "";
        var chargeStart = c.Pos;
        while (c.Current is '+' or '-' or '⁺' or '⁻' or '•') c.Pos++;
        if (body.Length == 0 || !char.IsAsciiLetterUpper(body[0]))
        {
            c.Pos = start;
            return "";
        }
        return Plain(body + c.Text[chargeStart..c.Pos]);
    }

    private static bool IsSubscript(char ch) => ch is >= '₀' and <= '₉';

    /// <summary>The text unchanged when it is already plain (the usual case), else with plain digits and charges.</summary>
    private static string Plain(string text)
    {
        var plain = true;
        foreach (var ch in text) plain &= ch < 128 || ch == '•';
        if (plain) return text;
        var sb = new StringBuilder(text.Length);
        foreach (var ch in text)
        {
            sb.Append(ch switch
            {
                >= '₀' and <= '₉' => (char)('0' + (ch - '₀')),
                '⁺' => '+',
                '⁻' => '-',
                _ => ch,
            });
        }
        return sb.ToString();
    }
}
