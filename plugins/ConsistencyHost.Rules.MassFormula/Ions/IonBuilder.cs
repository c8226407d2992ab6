using System.Globalization;

namespace ConsistencyHost.Rules.MassFormula.Ions;

/// <summary>Builds the ion a label describes from a molecule M: n·M plus and minus the label's groups.</summary>
internal static class IonBuilder
{
    /// <summary>The ion, or null and why the label does not fit M.</summary>
    /// <param name="label">The ion label read.</param>
    /// <param name="molecule">M's atoms and mass.</param>
    /// <param name="moleculeCharge">M's own net charge (a quaternary ammonium salt drawn as the cation is +1).</param>
    public static (Ion? Ion, string? Problem) Build(IonLabel label, Composition molecule, int moleculeCharge)
    {
        var composition = molecule.Times(label.Multiplier);
        foreach (var g in label.Groups)
        {
            composition = composition.Plus(g.Composition, g.Sign * g.Count);
        }

        if (composition.NegativeElement is { } missing)
        {
            return (null, $"the ion {label.Canonical} removes more {missing} than the molecule has");
        }

        var balanced = (label.Multiplier * moleculeCharge) + label.CarriedCharge;
        // Without any charge-carrying group, a charge one off the molecule's own is an odd-electron ion:
        // M+• (electron ionisation), M−•, or a fragment such as [M−CH3]+ written beside it.
        var oddElectron = !label.HasCarrier && Math.Abs(label.Charge - balanced) == 1;
        if (balanced != label.Charge && !oddElectron)
        {
            return (null, string.Create(CultureInfo.InvariantCulture,
                $"the charge of {label.Canonical} ({label.Charge:+0;-0}) does not follow from M ({moleculeCharge:+0;-0;0}) and its adducts ({balanced:+0;-0;0})"));
        }

        return (new Ion(composition, label.Charge), null);
    }
}
