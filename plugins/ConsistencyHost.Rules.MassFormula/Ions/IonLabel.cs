namespace ConsistencyHost.Rules.MassFormula.Ions;

/// <summary>One group of an ion label: "+Na", "−H2O", "+2H".</summary>
/// <param name="Sign">+1 when the group is added, −1 when it is removed.</param>
/// <param name="Count">How many times (the 2 of "+2H").</param>
/// <param name="Text">The group as written ("NH4", "HCOO").</param>
/// <param name="Composition">Its atoms and their mass.</param>
/// <param name="CarrierCharge">The charge the group brings when attached (see <see cref="AdductCarriers"/>).</param>
internal sealed record LabelGroup(int Sign, int Count, string Text, Composition Composition, int CarrierCharge)
{
    /// <summary>Net charge this group contributes to the ion.</summary>
    public int NetCharge => Sign * Count * CarrierCharge;
}

/// <summary>An ion label read into its parts: "[2M+Na]+" is 2 × M, plus Na, charge +1.</summary>
/// <param name="Canonical">The label in one spelling ("[M+H]+", "[M-H2O+H]+", "[M]+•").</param>
/// <param name="Multiplier">How many molecules M (the 2 of "[2M+Na]+").</param>
/// <param name="Groups">The added and removed groups, in written order.</param>
/// <param name="Charge">Signed charge of the ion.</param>
/// <param name="RadicalMark">True when the label carries "•" (an odd-electron ion).</param>
internal sealed record IonLabel(string Canonical, int Multiplier, IReadOnlyList<LabelGroup> Groups, int Charge, bool RadicalMark)
{
    /// <summary>Net charge the groups bring (without M's own charge).</summary>
    public int CarriedCharge => Groups.Sum(g => g.NetCharge);

    /// <summary>True when any group carries a charge.</summary>
    public bool HasCarrier => Groups.Any(g => g.CarrierCharge != 0);
}
