using ConsistencyHost.Chemistry.Model;
using ConsistencyHost.Chemistry.Perception.Symmetry;

namespace ConsistencyHost.Spectra.Analysis.Prediction.Coupling;

/// <summary>
/// Builds the first-order coupling tree of every hydrogen class from the partners the equivalence perception
/// found (2J, 3J, 4J through unsaturation, 19F/31P within three bonds), typing each coupling by the path
/// between the two parent atoms. One pass over the classes; each link looks only at the two parents.
/// </summary>
public static class CouplingTreeBuilder
{
    /// <summary>One tree per hydrogen class, in class order.</summary>
    public static IReadOnlyList<CouplingTree> Build(PredictionContext context, NmrEquivalence equivalence)
    {
        ArgumentNullException.ThrowIfNull(context);
        ArgumentNullException.ThrowIfNull(equivalence);
        var classes = equivalence.HydrogenClasses;
        var trees = new CouplingTree[classes.Length];
        for (var c = 0; c < classes.Length; c++) trees[c] = TreeOf(context, classes, c);
        return trees;
    }

    private static CouplingTree TreeOf(PredictionContext context, System.Collections.Immutable.ImmutableArray<HydrogenClass> classes, int c)
    {
        var m = context.Molecule;
        var group = classes[c];
        var p = group.ParentAtoms[0];
        var links = new List<CouplingLink>();
        // Loops over the partner lists rather than LINQ (Concat, Distinct, GroupBy): this runs on every checked
        // entry, and the allocations of the query form cost more than the typing itself.
        Span<int> counts = stackalloc int[3];
        Span<int> firstAtom = stackalloc int[3];
        ReadOnlySpan<System.Collections.Immutable.ImmutableArray<int>> lists = [group.Geminal2J, group.Vicinal3J, group.LongRange4J];
        for (var li = 0; li < lists.Length; li++)
        {
            for (var di = 0; di < lists[li].Length; di++)
            {
                var d = lists[li][di];
                if (SeenBefore(lists, li, di)) continue;
                var partner = classes[d];
                // Partners of one class may sit at different distances from this proton (ortho and para of a
                // para-disubstituted ring): one branch per distance, para (five bonds) left out.
                counts.Clear();
                foreach (var q in partner.ParentAtoms)
                {
                    var distance = NearDistance(m, p, q);
                    if (distance > 2) continue;
                    if (counts[distance]++ == 0) firstAtom[distance] = q;
                }

                for (var distance = 0; distance <= 2; distance++)
                {
                    if (counts[distance] == 0) continue;
                    var type = Type(context, p, firstAtom[distance], distance, group.IsExchangeable || partner.IsExchangeable);
                    if (type == CouplingType.VicinalRing && FlipAveraged(context, group, partner, p, firstAtom[distance])) type = CouplingType.VicinalRingAveraged;
                    links.Add(new CouplingLink(d, -1, counts[distance], distance + 2, type, JTable.Of(type)));
                }
            }
        }

        foreach (var x in group.HeteronuclearNeighbours)
        {
            var bonds = NearDistance(m, p, x) + 1;
            var type = HeteroType(m.Atoms[x].AtomicNumber, bonds);
            if (type == CouplingType.HF3J && OrthoOnArene(context, p, x)) type = CouplingType.HF3JAromaticOrtho;
            links.Add(new CouplingLink(-1, x, 1, bonds, type, JTable.Of(type)));
        }

        return new CouplingTree(c, links);
    }

    /// <summary>
    /// True when both carbons are CH2 groups whose two protons fall in one class each, in a ring of six or more
    /// atoms and in no other ring: the ring inverts fast enough to make its axial and equatorial protons one class,
    /// so each coupling is an average that cannot vanish. A fused, bridged or five-membered ring keeps its Karplus range.
    /// </summary>
    private static bool FlipAveraged(PredictionContext context, HydrogenClass group, HydrogenClass partner, int p, int q)
    {
        var m = context.Molecule;
        if (m.Atoms[p].HydrogenCount != 2 || m.Atoms[q].HydrogenCount != 2) return false;
        if (Occurrences(group.ParentAtoms, p) != 2 || Occurrences(partner.ParentAtoms, q) != 2) return false;
        if (SmallestCommonRing(context, p, q) < 6) return false;
        var ringsOfP = 0;
        var ringsOfQ = 0;
        foreach (var ring in context.Rings.Rings)
        {
            if (ring.Contains(p)) ringsOfP++;
            if (ring.Contains(q)) ringsOfQ++;
        }

        return ringsOfP == 1 && ringsOfQ == 1;
    }

    private static int Occurrences(System.Collections.Immutable.ImmutableArray<int> atoms, int atom)
    {
        var n = 0;
        foreach (var a in atoms)
        {
            if (a == atom) n++;
        }

        return n;
    }

    /// <summary>True when the partner at <paramref name="list"/>[<paramref name="at"/>] already appeared earlier (a class listed twice gets one branch set).</summary>
    private static bool SeenBefore(ReadOnlySpan<System.Collections.Immutable.ImmutableArray<int>> lists, int list, int at)
    {
        var d = lists[list][at];
        for (var li = 0; li <= list; li++)
        {
            var end = li == list ? at : lists[li].Length;
            for (var i = 0; i < end; i++)
            {
                if (lists[li][i] == d) return true;
            }
        }

        return false;
    }

    /// <summary>13C–19F couplings of a carbon atom: every fluorine within three bonds (1J–4J).</summary>
    public static IReadOnlyList<CouplingLink> CarbonFluorine(Molecule molecule, int carbon)
    {
        ArgumentNullException.ThrowIfNull(molecule);
        var links = new List<CouplingLink>();
        for (var x = 0; x < molecule.AtomCount; x++)
        {
            if (molecule.Atoms[x].AtomicNumber != 9) continue;
            var bonds = Distance(molecule, carbon, x, 4);
            if (bonds is < 1 or > 4) continue;
            var type = bonds switch { 1 => CouplingType.CF1J, 2 => CouplingType.CF2J, 3 => CouplingType.CF3J, _ => CouplingType.CF4J };
            links.Add(new CouplingLink(-1, x, 1, bonds, type, JTable.Of(type)));
        }

        return links;
    }

    private static CouplingType Type(PredictionContext context, int p, int q, int distance, bool exchangeable)
    {
        var m = context.Molecule;
        if (distance == 0) return HasDoubleBond(m, p) ? CouplingType.GeminalVinyl : CouplingType.GeminalSp3;
        if (distance == 2)
        {
            return context.IsAromatic(p) && context.IsAromatic(q) && SmallestCommonRing(context, p, q) == 6 ? CouplingType.AromaticMeta : CouplingType.LongRange;
        }

        if (exchangeable) return CouplingType.VicinalExchangeable;
        var bond = m.BondBetween(p, q);
        if (context.IsAromaticBond(p, q))
        {
            var ring = SmallestCommonRing(context, p, q);
            if (ring == 5) return CouplingType.AromaticFiveRing;
            return NextToAromaticNitrogen(context, p) || NextToAromaticNitrogen(context, q) ? CouplingType.AromaticOrthoNextToNitrogen : CouplingType.AromaticOrtho;
        }

        if (m.Bonds[bond].Order == 2)
        {
            if (SmallestCommonRing(context, p, q) is > 0 and <= 7) return CouplingType.VinylCisInSmallRing;
            return VinylConfiguration(m, bond, p, q);
        }

        if (IsAldehydeCarbon(m, p) || IsAldehydeCarbon(m, q)) return CouplingType.VicinalAldehyde;
        return context.Rings.BondInRing[bond] ? CouplingType.VicinalRing : CouplingType.VicinalFreelyRotating;
    }

    /// <summary>
    /// Cis or trans from the drawn configuration, when each carbon carries one H and one other substituent
    /// (then the two H are placed as their substituents are). A =CH2, or an undrawn configuration, stays open.
    /// </summary>
    private static CouplingType VinylConfiguration(Molecule m, int bond, int p, int q)
    {
        if (m.Degree(p) != 2 || m.Degree(q) != 2 || m.Atoms[p].HydrogenCount != 1 || m.Atoms[q].HydrogenCount != 1) return CouplingType.VinylCisOrTrans;
        foreach (var stereo in m.DoubleBondStereo)
        {
            if (stereo.Bond != bond) continue;
            return stereo.Configuration == DoubleBondConfiguration.Cis ? CouplingType.VinylCis : CouplingType.VinylTrans;
        }

        return CouplingType.VinylCisOrTrans;
    }

    /// <summary>True when <paramref name="fluorine"/> sits on an aromatic carbon bonded through the ring to aromatic <paramref name="carbon"/>.</summary>
    private static bool OrthoOnArene(PredictionContext context, int carbon, int fluorine)
    {
        if (!context.IsAromatic(carbon)) return false;
        foreach (var y in context.Molecule.Neighbours(fluorine))
        {
            if (context.IsAromatic(y) && context.Molecule.BondBetween(carbon, y) >= 0 && context.IsAromaticBond(carbon, y)) return true;
        }

        return false;
    }

    private static CouplingType HeteroType(int element, int bonds) => (element, bonds) switch
    {
        (9, <= 2) => CouplingType.HF2J,
        (9, 3) => CouplingType.HF3J,
        (9, _) => CouplingType.HF4J,
        (_, 1) => CouplingType.HP1J,
        (_, 2) => CouplingType.HP2J,
        (_, 3) => CouplingType.HP3J,
        _ => CouplingType.HP4J,
    };

    private static bool HasDoubleBond(Molecule m, int atom)
    {
        foreach (var b in m.BondsOf(atom))
        {
            if (m.Bonds[b].Order == 2 && !m.Bonds[b].IsAromatic) return true;
        }

        return false;
    }

    private static bool IsAldehydeCarbon(Molecule m, int atom)
    {
        if (m.Atoms[atom].AtomicNumber != 6 || m.Atoms[atom].HydrogenCount != 1) return false;
        var bonds = m.BondsOf(atom);
        var neighbours = m.Neighbours(atom);
        for (var i = 0; i < bonds.Length; i++)
        {
            if (m.Bonds[bonds[i]].Order == 2 && m.Atoms[neighbours[i]].AtomicNumber == 8) return true;
        }

        return false;
    }

    private static bool NextToAromaticNitrogen(PredictionContext context, int atom)
    {
        foreach (var n in context.Molecule.Neighbours(atom))
        {
            if (context.Molecule.Atoms[n].AtomicNumber == 7 && context.IsAromatic(n)) return true;
        }

        return false;
    }

    /// <summary>Size of the smallest ring holding both atoms; 0 when none does.</summary>
    private static int SmallestCommonRing(PredictionContext context, int a, int b)
    {
        var best = 0;
        foreach (var ring in context.Rings.Rings)
        {
            if (ring.Contains(a) && ring.Contains(b) && (best == 0 || ring.Length < best)) best = ring.Length;
        }

        return best;
    }

    /// <summary>Bonds between two atoms: 0, 1 or 2, and 3 for anything farther (no search, no allocation).</summary>
    private static int NearDistance(Molecule m, int a, int b)
    {
        if (a == b) return 0;
        var neighbours = m.Neighbours(a);
        foreach (var n in neighbours)
        {
            if (n == b) return 1;
        }

        foreach (var n in neighbours)
        {
            foreach (var y in m.Neighbours(n))
            {
                if (y == b) return 2;
            }
        }

        return 3;
    }

    /// <summary>Bonds between two atoms, counted up to <paramref name="limit"/> (returns limit + 1 beyond it).</summary>
    private static int Distance(Molecule m, int a, int b, int limit)
    {
        if (a == b) return 0;
        var frontier = new List<int> { a };
        var seen = new HashSet<int> { a };
        for (var d = 1; d <= limit; d++)
        {
            var next = new List<int>();
            foreach (var x in frontier)
            {
                foreach (var y in m.Neighbours(x))
                {
                    if (y == b) return d;
                    if (seen.Add(y)) next.Add(y);
                }
            }

            frontier = next;
        }

        return limit + 1;
    }
}
