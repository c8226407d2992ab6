namespace ConsistencyHost.Chemistry.Model;

/// <summary>How a bond was drawn or written with respect to stereochemistry.</summary>
public enum BondStereoMark
{
    /// <summary>No mark.</summary>
    None,
    /// <summary>SMILES '/' written from <see cref="Bond.Begin"/> to <see cref="Bond.End"/>.</summary>
    Up,
    /// <summary>SMILES '\' written from <see cref="Bond.Begin"/> to <see cref="Bond.End"/>.</summary>
    Down,
    /// <summary>Molfile wedge, narrow end at <see cref="Bond.Begin"/>.</summary>
    Wedge,
    /// <summary>Molfile hash, narrow end at <see cref="Bond.Begin"/>.</summary>
    Hash,
    /// <summary>Molfile "either" (wavy or crossed): configuration deliberately unknown.</summary>
    Either,
}

/// <summary>A bond between two atoms of a <see cref="Molecule"/>.</summary>
/// <param name="Begin">First atom index (the atom written or drawn first).</param>
/// <param name="End">Second atom index.</param>
/// <param name="Order">1, 2 or 3 (4 for quadruple); aromatic bonds carry their Kekulé order.</param>
/// <param name="IsAromatic">Aromatic as read.</param>
/// <param name="Mark">Stereo mark as read.</param>
public readonly record struct Bond(int Begin, int End, int Order, bool IsAromatic, BondStereoMark Mark)
{
    /// <summary>The atom at the other end from <paramref name="atom"/>.</summary>
    public int Other(int atom) => atom == Begin ? End : Begin;
}
