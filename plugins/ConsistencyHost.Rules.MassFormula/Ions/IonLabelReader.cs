using System.Globalization;
using System.Text;
using System.Text.RegularExpressions;
using ConsistencyHost.Chemistry.Perception.Formula;

namespace ConsistencyHost.Rules.MassFormula.Ions;

/// <summary>
/// Reads the ion labels authors write: "[M+H]+", "[M + H]+", "(M+H)+", "[M+H]⁺", "MH+", "MNa+", "M+•",
/// "[M]+", "M⁺˙", "[M−H]−", "[M+2H]2+", "[M+H−H2O]+", "[2M+Na]+".
/// </summary>
/// <remarks>
/// Common practice: the label forms of journal HRMS lines (nmr-data-standards.md §5, §7.3).
/// The patterns are anchored and linear, so they need no match time-out; stating Timeout.Infinite keeps the
/// generated code from reading the process-wide default time-out through AppContext.GetData, which is not on the
/// plugin allow-list.
/// </remarks>
internal static partial class IonLabelReader
{
    [GeneratedRegex(@"^(?<open>\[)?(?<n>[1-9]?)M(?<groups>(?:[+-][1-9]?[A-Z][A-Za-z0-9]*)*)(?(open)\])(?<z1>[1-9]?)(?<sign>[+-])(?<z2>[1-9]?)$", RegexOptions.CultureInvariant, Timeout.Infinite)]
    private static partial Regex LabelPattern();

    [GeneratedRegex(@"^(?<n>[1-9]?)M(?<group>[A-Z][A-Za-z0-9]*)(?<z>[1-9]?)(?<sign>[+-])$", RegexOptions.CultureInvariant, Timeout.Infinite)]
    private static partial Regex ShortPattern();

    [GeneratedRegex(@"[+-][1-9]?[A-Z][A-Za-z0-9]*", RegexOptions.CultureInvariant, Timeout.Infinite)]
    private static partial Regex GroupPattern();

    /// <summary>The label read, or null and a sentence saying what is wrong with it.</summary>
    public static (IonLabel? Label, string? Problem) Read(string text)
    {
        var (plain, radical) = Normalise(text);
        var shortForm = ShortPattern().Match(plain);
        if (shortForm.Success)
        {
            // "MH+" and "MNa+" are shorthand for "[M+H]+" and "[M+Na]+".
            plain = $"[{shortForm.Groups["n"].Value}M+{shortForm.Groups["group"].Value}]{shortForm.Groups["z"].Value}{shortForm.Groups["sign"].Value}";
        }

        var match = LabelPattern().Match(plain);
        if (!match.Success || (match.Groups["z1"].Length > 0 && match.Groups["z2"].Length > 0))
        {
            return (null, $"'{text}' is not an ion label of the form [M+H]+, [M−H]−, [M+2H]2+, [M+H−H2O]+ or M+•");
        }

        var groups = new List<LabelGroup>();
        foreach (Match g in GroupPattern().Matches(match.Groups["groups"].Value))
        {
            var (group, problem) = ReadGroup(g.Value, text);
            if (group is null) return (null, problem);
            groups.Add(group);
        }

        var magnitude = Digit(match.Groups["z1"].Value + match.Groups["z2"].Value);
        var charge = match.Groups["sign"].Value == "+" ? magnitude : -magnitude;
        var canonical = Canonical(match.Groups["n"].Value, groups, charge, radical);
        return (new IonLabel(canonical, Digit(match.Groups["n"].Value), groups, charge, radical), null);
    }

    private static (LabelGroup? Group, string? Problem) ReadGroup(string written, string label)
    {
        var sign = written[0] == '+' ? 1 : -1;
        var hasCount = char.IsAsciiDigit(written[1]);
        var formulaText = written[(hasCount ? 2 : 1)..];
        var (formula, error) = MolecularFormula.Parse(formulaText);
        if (formula is null)
        {
            return (null, $"'{formulaText}' in the ion label '{label}' is not an elemental formula ({error})");
        }

        var composition = Composition.Of(formula);
        var carrier = AdductCarriers.ChargeOf(composition.Hill(0));
        return (new LabelGroup(sign, hasCount ? written[1] - '0' : 1, formulaText, composition, carrier), null);
    }

    /// <summary>Removes blanks, makes superscripts, minus signs and radical dots plain, and (…) into […].</summary>
    private static (string Plain, bool Radical) Normalise(string text)
    {
        var sb = new StringBuilder(text.Length);
        var radical = false;
        foreach (var ch in text)
        {
            switch (ch)
            {
                case '•' or '·' or '˙' or '∙': radical = true; break;
                case '⁺': sb.Append('+'); break;
                case '⁻' or '−' or '–': sb.Append('-'); break;
                case '(': sb.Append('['); break;
                case ')': sb.Append(']'); break;
                case '⁰' or '¹' or '²' or '³' or (>= '⁴' and <= '⁹'): sb.Append(SuperscriptDigit(ch)); break;
                case var c when char.IsWhiteSpace(c): break;
                default: sb.Append(ch); break;
            }
        }

        return (sb.ToString(), radical);
    }

    private static char SuperscriptDigit(char ch) => ch switch
    {
        '¹' => '1',
        '²' => '2',
        '³' => '3',
        _ => (char)('0' + (ch - '⁰')),
    };

    private static int Digit(string text) => text.Length == 0 ? 1 : int.Parse(text, NumberStyles.None, CultureInfo.InvariantCulture);

    private static string Canonical(string multiplier, IReadOnlyList<LabelGroup> groups, int charge, bool radical)
    {
        var sb = new StringBuilder("[").Append(multiplier).Append('M');
        foreach (var g in groups)
        {
            sb.Append(g.Sign > 0 ? '+' : '-');
            if (g.Count > 1) sb.Append(g.Count.ToString(CultureInfo.InvariantCulture));
            sb.Append(g.Text);
        }

        sb.Append(']');
        if (Math.Abs(charge) > 1) sb.Append(Math.Abs(charge).ToString(CultureInfo.InvariantCulture));
        sb.Append(charge > 0 ? '+' : '-');
        return radical ? sb.Append('•').ToString() : sb.ToString();
    }
}
