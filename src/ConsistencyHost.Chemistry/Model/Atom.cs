namespace ConsistencyHost.Chemistry.Model;

/// <summary>A heavy atom (or a lone hydrogen atom such as in [H+] or [H][H]) of a <see cref="Molecule"/>.</summary>
/// <param name="AtomicNumber">Z; 0 for a wildcard atom.</param>
/// <param name="Charge">Formal charge.</param>
/// <param name="Isotope">Mass number; 0 means the natural isotopic composition.</param>
/// <param name="HydrogenCount">Total attached hydrogens: implicit ones from the valence model plus bracket
/// H counts plus explicit H atoms folded in by a reader.</param>
/// <param name="IsAromatic">Aromatic as read (lowercase SMILES symbol or aromatic molfile bond); not perceived.</param>
/// <param name="AtomClass">SMILES atom class (":n"), 0 when absent.</param>
/// <param name="Radical">Number of unpaired electrons (0 none, 1 doublet, 2 triplet/singlet).</param>
public readonly record struct Atom(
    int AtomicNumber,
    int Charge,
    int Isotope,
    int HydrogenCount,
    bool IsAromatic,
    int AtomClass,
    int Radical)
{
    /// <summary>IUPAC element symbol ("*" for a wildcard).</summary>
    public string Symbol => Elements.SymbolOf(AtomicNumber);
}
