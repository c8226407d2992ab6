using System.Collections.Immutable;
using System.Globalization;
using ConsistencyHost.Chemistry.Model;

namespace ConsistencyHost.Chemistry.Perception.Symmetry;

/// <summary>
/// Coordination geometry of metal centres is not modelled: the graph says which ligands a metal carries, not
/// which are cis or trans to each other. In an octahedral or square-planar complex two ligands that are equal in
/// the graph can differ (the four N cis and the one N trans to the acetate of [Co(NH3)5(OAc)]2+), so the
/// counts of such a molecule get an honest upper bound and a reason instead of a confident figure.
/// </summary>
internal static class MetalGeometry
{
    /// <summary>Fewest ligands at which cis/trans arrangements exist (square planar, octahedral; common practice).</summary>
    private const int MinLigands = 4;

    /// <summary>
    /// The counts widened for every d- or f-block centre with at least <see cref="MinLigands"/> ligands, two of them
    /// constitutionally equal; the counts unchanged otherwise.
    /// </summary>
    public static (SignalCountRange Hydrogen, SignalCountRange Carbon) Widen(
        Molecule molecule, int[] constitutionalOrbit, ImmutableArray<HydrogenClass> hydrogens, ImmutableArray<ImmutableArray<int>> carbons,
        SignalCountRange h, SignalCountRange c)
    {
        var centre = FirstUnmodelledCentre(molecule, constitutionalOrbit);
        if (centre < 0) return (h, c);

        // Upper bound: geometry can at most tell apart every atom of a class (each H-bearing atom its own signal).
        var hydrogenMax = hydrogens.Sum(x => x.ParentAtoms.Distinct().Count());
        var carbonMax = carbons.Sum(x => x.Length);
        var reason = string.Create(CultureInfo.InvariantCulture,
            $"{molecule.Atoms[centre].Symbol} centre (atom {centre}) with {molecule.Neighbours(centre).Length} ligands: coordination geometry (octahedral, square planar) is not modelled, so ligands equal in the graph may be cis/trans-inequivalent");
        return (Widened(h, hydrogenMax, reason), Widened(c, carbonMax, reason));
    }

    private static SignalCountRange Widened(SignalCountRange range, int max, string reason) =>
        range with { Max = Math.Max(range.Max, max), Reasons = [.. range.Reasons, reason] };

    private static int FirstUnmodelledCentre(Molecule molecule, int[] orbit)
    {
        for (var v = 0; v < molecule.AtomCount; v++)
        {
            if (!IsDOrFBlock(molecule.Atoms[v].AtomicNumber)) continue;
            var ligands = molecule.Neighbours(v);
            if (ligands.Length < MinLigands) continue;
            var seen = new HashSet<int>();
            foreach (var ligand in ligands)
            {
                if (!seen.Add(orbit[ligand])) return v;
            }
        }

        return -1;
    }

    private static bool IsDOrFBlock(int z) => z is (>= 21 and <= 30) or (>= 39 and <= 48) or (>= 57 and <= 80) or (>= 89 and <= 112);
}
