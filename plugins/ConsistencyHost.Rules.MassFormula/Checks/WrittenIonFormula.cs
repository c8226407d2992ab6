using System.Text;
using ConsistencyHost.Chemistry.Perception.Formula;
using ConsistencyHost.Rules.MassFormula.Ions;

namespace ConsistencyHost.Rules.MassFormula.Checks;

/// <summary>The formula written after "calcd for", read: "C12H15NO3Na", "C8H11N4O2+", "C8H11N4O2⁺".</summary>
/// <param name="Composition">Its atoms and neutral-atom mass.</param>
/// <param name="Charge">The charge written with it; 0 when none is written (most authors write none).</param>
internal sealed record WrittenIonFormula(Composition Composition, int Charge)
{
    /// <summary>The formula, or null and the formula reader's message.</summary>
    public static (WrittenIonFormula? Formula, string? Problem) Read(string text)
    {
        var (formula, error) = MolecularFormula.Parse(Plain(text));
        return formula is null ? (null, error) : (new WrittenIonFormula(Composition.Of(formula), formula.Charge), null);
    }

    /// <summary>The ion this formula describes, with its own charge or else the label's.</summary>
    public Ion AsIon(int labelCharge) => new(Composition, Charge != 0 ? Charge : labelCharge);

    /// <summary>Superscript charges and minus signs made plain; radical dots dropped (the label carries them).</summary>
    private static string Plain(string text)
    {
        var sb = new StringBuilder(text.Length);
        foreach (var ch in text)
        {
            switch (ch)
            {
                case '⁺': sb.Append('+'); break;
                case '⁻' or '−': sb.Append('-'); break;
                case '•' or '·' or '˙': break;
                default: sb.Append(ch); break;
            }
        }

        return sb.ToString();
    }
}
