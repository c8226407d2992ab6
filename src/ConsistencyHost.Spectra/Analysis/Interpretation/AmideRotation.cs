using ConsistencyHost.Chemistry.Model;
using ConsistencyHost.Chemistry.Perception.Symmetry;

namespace ConsistencyHost.Spectra.Analysis.Interpretation;

/// <summary>A class whose two halves become distinct when rotation about an amide C–N bond is slow.</summary>
/// <param name="ClassIndex">The class (hydrogen class index, or the index of a carbon class).</param>
/// <param name="FirstHalf">Members on the substituent cis to the carbonyl O (or S): parent atoms for hydrogens.</param>
/// <param name="SecondHalf">Members on the other substituent.</param>
public sealed record SplittableClass(int ClassIndex, IReadOnlyList<int> FirstHalf, IReadOnlyList<int> SecondHalf);

/// <summary>
/// Slow rotation about the C–N bond of amides, thioamides and carbamates (barriers of roughly 15–21 kcal/mol,
/// so two N-substituents are distinct on the NMR time scale at room temperature: N,N-dimethylformamide shows
/// two N-methyl singlets, 2.96 and 2.88 ppm in CDCl3, Gottlieb et al. 1997). The chemistry core already widens
/// the expected counts for it; the interpreter also needs the split classes themselves (which protons go
/// together) to assign integrals, which this finds.
/// </summary>
/// <remarks>
/// Handled: a carbonyl or thiocarbonyl carbon bonded to exactly one nitrogen that carries two substituents
/// other than that carbon, both in the same constitutional class; and the NH2 of a primary amide. Not handled: ureas and guanidines (several
/// C–N bonds share the barrier), secondary amides (cis/trans rotamers are separate species; authors report
/// them as minor rotamers), atropisomers.
/// </remarks>
public static class AmideRotation
{
    /// <summary>Hydrogen and carbon classes split by slow amide rotation.</summary>
    public static (IReadOnlyList<SplittableClass> Hydrogen, IReadOnlyList<SplittableClass> Carbon) Splits(Molecule molecule, NmrEquivalence equivalence)
    {
        ArgumentNullException.ThrowIfNull(molecule);
        ArgumentNullException.ThrowIfNull(equivalence);
        var hydrogen = new List<SplittableClass>();
        var carbon = new List<SplittableClass>();
        hydrogen.AddRange(PrimaryAmideHydrogens(molecule, equivalence));
        foreach (var (nitrogen, first, second) in Amides(molecule, equivalence.Constitutional))
        {
            var firstBranch = Branch(molecule, first, nitrogen);
            var secondBranch = Branch(molecule, second, nitrogen);
            hydrogen.AddRange(SplitClasses(equivalence.HydrogenClasses.Select(c => (IReadOnlyList<int>)c.ParentAtoms), firstBranch, secondBranch, hydrogen));
            carbon.AddRange(SplitClasses(equivalence.CarbonClasses13C.Select(c => (IReadOnlyList<int>)c), firstBranch, secondBranch, carbon));
        }

        return (hydrogen, carbon);
    }

    /// <summary>
    /// The NH2 of a primary amide: its two protons are cis and trans to the carbonyl O, and show as two broad
    /// singlets when rotation is slow (benzamide in DMSO-d6, common practice).
    /// </summary>
    private static IEnumerable<SplittableClass> PrimaryAmideHydrogens(Molecule molecule, NmrEquivalence equivalence)
    {
        var classes = equivalence.HydrogenClasses;
        for (var c = 0; c < classes.Length; c++)
        {
            var parents = classes[c].ParentAtoms;
            if (parents.Length == 0 || !parents.All(n => IsPrimaryAmideNitrogen(molecule, n))) continue;
            var distinct = parents.Distinct().ToList();
            yield return new SplittableClass(c, distinct, distinct);
        }
    }

    private static bool IsPrimaryAmideNitrogen(Molecule molecule, int n) =>
        molecule.Atoms[n] is { AtomicNumber: 7, Charge: 0, HydrogenCount: 2, IsAromatic: false }
        && molecule.Degree(n) == 1
        && IsAcylCarbon(molecule, molecule.Neighbours(n)[0])
        && CountNitrogens(molecule, molecule.Neighbours(n)[0]) == 1;

    private static IEnumerable<(int Nitrogen, int First, int Second)> Amides(Molecule molecule, ConstitutionalClasses constitutional)
    {
        for (var n = 0; n < molecule.AtomCount; n++)
        {
            if (molecule.Atoms[n].AtomicNumber != 7 || molecule.Atoms[n].Charge != 0 || molecule.Atoms[n].IsAromatic || molecule.Degree(n) != 3) continue;
            var carbonyls = molecule.Neighbours(n).ToArray().Where(c => IsAcylCarbon(molecule, c)).ToList();
            if (carbonyls.Count != 1 || CountNitrogens(molecule, carbonyls[0]) != 1) continue;
            var others = molecule.Neighbours(n).ToArray().Where(a => a != carbonyls[0]).ToList();
            if (constitutional.OrbitOf[others[0]] == constitutional.OrbitOf[others[1]])
            {
                yield return (n, others[0], others[1]);
            }
        }
    }

    private static bool IsAcylCarbon(Molecule molecule, int atom)
    {
        if (molecule.Atoms[atom].AtomicNumber != 6) return false;
        foreach (var other in molecule.Neighbours(atom))
        {
            var bond = molecule.Bonds[molecule.BondBetween(atom, other)];
            if (bond.Order == 2 && !bond.IsAromatic && molecule.Atoms[other].AtomicNumber is 8 or 16) return true;
        }

        return false;
    }

    private static int CountNitrogens(Molecule molecule, int atom)
    {
        var count = 0;
        foreach (var other in molecule.Neighbours(atom)) count += molecule.Atoms[other].AtomicNumber == 7 ? 1 : 0;
        return count;
    }

    /// <summary>Atoms reachable from <paramref name="start"/> without passing <paramref name="blocked"/>.</summary>
    private static HashSet<int> Branch(Molecule molecule, int start, int blocked)
    {
        var seen = new HashSet<int> { start };
        var queue = new Queue<int>([start]);
        while (queue.Count > 0)
        {
            foreach (var next in molecule.Neighbours(queue.Dequeue()))
            {
                if (next != blocked && seen.Add(next)) queue.Enqueue(next);
            }
        }

        return seen;
    }

    private static IEnumerable<SplittableClass> SplitClasses(IEnumerable<IReadOnlyList<int>> classes, HashSet<int> first, HashSet<int> second, List<SplittableClass> already)
    {
        if (first.Overlaps(second)) yield break; // a ring through N: the substituents are one branch
        var index = 0;
        foreach (var members in classes)
        {
            var a = members.Where(first.Contains).ToList();
            var b = members.Where(second.Contains).ToList();
            if (a.Count > 0 && a.Count == b.Count && a.Count + b.Count == members.Count && already.All(s => s.ClassIndex != index))
            {
                yield return new SplittableClass(index, a, b);
            }

            index++;
        }
    }
}
