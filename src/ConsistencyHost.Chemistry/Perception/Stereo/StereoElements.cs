namespace ConsistencyHost.Chemistry.Perception.Stereo;

/// <summary>A tetrahedral stereo element for symmetry bookkeeping: neighbour slots and a parity bit.</summary>
/// <param name="Centre">The centre atom.</param>
/// <param name="Neighbours">Four neighbour atoms; -1 is the implicit hydrogen or lone pair.</param>
/// <param name="Parity">0 anticlockwise ('@'), 1 clockwise ('@@').</param>
/// <param name="Specified">True when the parity is fixed (from the input, or arbitrary for a non-stereogenic
/// centre); false when it is assigned while enumerating.</param>
/// <param name="FixedByRings">A bridgehead of a bridged ring system: its configuration is set by the rings, not
/// free. Unspecified ones are enumerated, but only the most symmetric assignment (the strain-free out,out
/// geometry of small bridged systems) is kept for each assignment of the free elements.</param>
/// <param name="Stereogenic">True for a stereocentre (its configuration matters); false for an sp3 centre with
/// two equal ligands whose arbitrary parity only serves the topicity bookkeeping of Algorithm A.</param>
internal sealed record TetrahedralElement(int Centre, int[] Neighbours, int Parity, bool Specified, bool Stereogenic = true, bool FixedByRings = false);

/// <summary>A double-bond stereo element for symmetry bookkeeping.</summary>
/// <param name="Begin">One end atom.</param>
/// <param name="End">The other end atom.</param>
/// <param name="BeginReference">Reference neighbour of Begin.</param>
/// <param name="EndReference">Reference neighbour of End (-1 for a lone pair on an imine N is never used: N ends
/// take their one substituent).</param>
/// <param name="Parity">0 cis, 1 trans.</param>
/// <param name="Specified">True when the parity is fixed (input, or arbitrary when not stereogenic).</param>
/// <param name="Stereogenic">True when both ends carry two different ligands.</param>
internal sealed record DoubleBondElement(int Begin, int End, int BeginReference, int EndReference, int Parity, bool Specified, bool Stereogenic = true);
