using System.Collections.Immutable;

namespace ConsistencyHost.Chemistry.Model;

/// <summary>Winding of the last three neighbours seen from the first, as in OpenSMILES '@' and '@@'.</summary>
public enum TetrahedralWinding
{
    /// <summary>'@': anticlockwise.</summary>
    Anticlockwise,
    /// <summary>'@@': clockwise.</summary>
    Clockwise,
}

/// <summary>Relative position of the two reference atoms of a double bond.</summary>
public enum DoubleBondConfiguration
{
    /// <summary>Same side (Z for the reference atoms).</summary>
    Cis,
    /// <summary>Opposite sides.</summary>
    Trans,
}

/// <summary>A specified tetrahedral configuration.</summary>
/// <param name="Centre">The stereocentre.</param>
/// <param name="Neighbours">Four neighbour atom indices in reference order; <see cref="ImplicitHydrogen"/> marks the
/// implicit (or folded) hydrogen or a lone pair.</param>
/// <param name="Winding">Winding of Neighbours[1..3] viewed from Neighbours[0].</param>
public sealed record TetrahedralStereo(int Centre, ImmutableArray<int> Neighbours, TetrahedralWinding Winding)
{
    /// <summary>Placeholder for an implicit hydrogen or a lone pair in <see cref="Neighbours"/>.</summary>
    public const int ImplicitHydrogen = -1;

    /// <summary>The opposite winding.</summary>
    public static TetrahedralWinding Invert(TetrahedralWinding w) =>
        w == TetrahedralWinding.Clockwise ? TetrahedralWinding.Anticlockwise : TetrahedralWinding.Clockwise;
}

/// <summary>A specified double-bond configuration.</summary>
/// <param name="Bond">Index of the double bond.</param>
/// <param name="BeginReference">A neighbour of the bond's Begin atom (not its End).</param>
/// <param name="EndReference">A neighbour of the bond's End atom (not its Begin).</param>
/// <param name="Configuration">Whether the two references are cis or trans.</param>
public sealed record DoubleBondStereo(int Bond, int BeginReference, int EndReference, DoubleBondConfiguration Configuration);
