using System.Collections.Immutable;
using ConsistencyHost.Chemistry.Model;

namespace ConsistencyHost.Chemistry.Perception.Rings;

/// <summary>Aromatic atoms and bonds perceived by Hückel's 4n+2 rule over single rings and fused pairs.</summary>
/// <remarks>
/// Hückel (1931) as applied in cheminformatics toolkits: a ring (or two rings sharing a bond, or a whole fused
/// system) whose atoms are all sp2 candidates is aromatic when its π-electron count is 4n+2. Contributions:
/// a ring double bond 1; a lone pair (neutral N/P with three single bonds, O/S/Se with two, C−) 2; an
/// exocyclic double bond to a heteroatom 0 (2-pyridone); an empty p orbital (C+, three-coordinate B) 0.
/// An exocyclic C=C or a triple bond excludes the atom. Independent of the Kekulé form read, so both Kekulé
/// structures of an arene give the same result.
/// </remarks>
public sealed class Aromaticity
{
    private Aromaticity(bool[] atoms, bool[] bonds)
    {
        AromaticAtoms = [.. atoms];
        AromaticBonds = [.. bonds];
    }

    /// <summary>Per atom: perceived aromatic.</summary>
    public ImmutableArray<bool> AromaticAtoms { get; }

    /// <summary>Per bond: perceived aromatic.</summary>
    public ImmutableArray<bool> AromaticBonds { get; }

    /// <summary>Perceives aromaticity.</summary>
    public static Aromaticity Of(Molecule molecule, RingSet rings)
    {
        var electrons = new int[molecule.AtomCount];
        for (var i = 0; i < molecule.AtomCount; i++)
        {
            electrons[i] = rings.AtomInRing[i] ? PiElectrons(molecule, rings, i) : -1;
        }

        var atoms = new bool[molecule.AtomCount];
        var bonds = new bool[molecule.Bonds.Length];
        var ringList = rings.Rings;
        var aromaticRing = new bool[ringList.Length];
        for (var r = 0; r < ringList.Length; r++)
        {
            aromaticRing[r] = IsHuckel(ringList[r], electrons);
        }

        for (var r = 0; r < ringList.Length; r++)
        {
            for (var s = r + 1; s < ringList.Length; s++)
            {
                if ((!aromaticRing[r] || !aromaticRing[s]) && SharesBond(ringList[r], ringList[s])
                    && IsHuckel(ringList[r].Union(ringList[s]).ToArray(), electrons))
                {
                    aromaticRing[r] = aromaticRing[s] = true;
                }
            }
        }

        for (var r = 0; r < ringList.Length; r++)
        {
            if (aromaticRing[r])
            {
                Mark(molecule, ringList[r], atoms, bonds);
            }
        }

        return new Aromaticity(atoms, bonds);
    }

    private static bool IsHuckel(IReadOnlyList<int> ring, int[] electrons)
    {
        var sum = 0;
        foreach (var a in ring)
        {
            if (electrons[a] < 0)
            {
                return false;
            }

            sum += electrons[a];
        }

        return sum >= 2 && (sum - 2) % 4 == 0;
    }

    private static bool SharesBond(ImmutableArray<int> a, ImmutableArray<int> b)
    {
        var shared = 0;
        foreach (var x in a)
        {
            shared += b.Contains(x) ? 1 : 0;
        }

        return shared >= 2;
    }

    private static void Mark(Molecule m, ImmutableArray<int> ring, bool[] atoms, bool[] bonds)
    {
        for (var k = 0; k < ring.Length; k++)
        {
            atoms[ring[k]] = true;
            var bond = m.BondBetween(ring[k], ring[(k + 1) % ring.Length]);
            if (bond >= 0)
            {
                bonds[bond] = true;
            }
        }
    }

    /// <summary>π electrons an in-ring atom gives, or -1 when it cannot be part of an aromatic ring.</summary>
    private static int PiElectrons(Molecule m, RingSet rings, int atom)
    {
        var a = m.Atoms[atom];
        var neighbours = m.Neighbours(atom);
        var bonds = m.BondsOf(atom);
        var ringDouble = false;
        var exoHetero = false;
        for (var k = 0; k < bonds.Length; k++)
        {
            var b = m.Bonds[bonds[k]];
            if (b.Order >= 3)
            {
                return -1;
            }

            if (b.Order == 2 && rings.BondInRing[bonds[k]])
            {
                ringDouble = true;
            }
            else if (b.Order == 2)
            {
                var other = m.Atoms[neighbours[k]].AtomicNumber;
                if (other == 6 || a.AtomicNumber != 6)
                {
                    return -1;
                }

                exoHetero = true;
            }
        }

        if (ringDouble)
        {
            return 1;
        }

        if (exoHetero)
        {
            return 0;
        }

        var sigma = bonds.Length + a.HydrogenCount;
        return (a.AtomicNumber, a.Charge, sigma) switch
        {
            (6, -1, 3) => 2,
            (6, 1, 3) => 0,
            (5, 0, 3) => 0,
            (7 or 15, 0, 3) => 2,
            (8 or 16 or 34 or 52, 0, 2) => 2,
            _ => -1,
        };
    }
}
