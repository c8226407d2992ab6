using ConsistencyHost.Chemistry.Model;

namespace ConsistencyHost.Spectra.Analysis.Prediction.Carbon.Core;

/// <summary>Small questions about one atom that every table asks (allocation-free walks over the adjacency).</summary>
internal static class Topology
{
    public const int Carbon = 6;
    public const int Nitrogen = 7;
    public const int Oxygen = 8;
    public const int Sulfur = 16;

    /// <summary>A carbon with four single bonds, not aromatic.</summary>
    public static bool IsSp3Carbon(PredictionContext context, int atom)
    {
        var m = context.Molecule;
        if (m.Atoms[atom].AtomicNumber != Carbon || context.IsAromatic(atom))
        {
            return false;
        }

        foreach (var b in m.BondsOf(atom))
        {
            if (m.Bonds[b].Order != 1)
            {
                return false;
            }
        }

        return true;
    }

    /// <summary>The atom joined to <paramref name="atom"/> by a bond of <paramref name="order"/> (optionally of one element), or −1.</summary>
    public static int PartnerByOrder(Molecule m, int atom, int order, int element = 0)
    {
        var neighbours = m.Neighbours(atom);
        var bonds = m.BondsOf(atom);
        for (var i = 0; i < neighbours.Length; i++)
        {
            if (m.Bonds[bonds[i]].Order == order && (element == 0 || m.Atoms[neighbours[i]].AtomicNumber == element))
            {
                return neighbours[i];
            }
        }

        return -1;
    }

    /// <summary>Number of neighbours of <paramref name="atom"/> with atomic number <paramref name="element"/>.</summary>
    public static int CountNeighbours(Molecule m, int atom, int element)
    {
        var n = 0;
        foreach (var x in m.Neighbours(atom))
        {
            if (m.Atoms[x].AtomicNumber == element)
            {
                n++;
            }
        }

        return n;
    }

    /// <summary>Number of neighbours that are not carbon (hydrogens are implicit and not counted).</summary>
    public static int CountHeteroNeighbours(Molecule m, int atom)
    {
        var n = 0;
        foreach (var x in m.Neighbours(atom))
        {
            if (m.Atoms[x].AtomicNumber != Carbon)
            {
                n++;
            }
        }

        return n;
    }

    /// <summary>Number of oxygens double-bonded to <paramref name="atom"/> (S=O, N=O, P=O counts).</summary>
    public static int DoubleBondedOxygens(Molecule m, int atom)
    {
        var n = 0;
        var neighbours = m.Neighbours(atom);
        var bonds = m.BondsOf(atom);
        for (var i = 0; i < neighbours.Length; i++)
        {
            if (m.Atoms[neighbours[i]].AtomicNumber == Oxygen && m.Bonds[bonds[i]].Order == 2)
            {
                n++;
            }
        }

        return n;
    }

    /// <summary>A carbon double-bonded to O or S (carbonyl or thiocarbonyl).</summary>
    public static bool IsCarbonylCarbon(Molecule m, int atom) =>
        m.Atoms[atom].AtomicNumber == Carbon
        && (PartnerByOrder(m, atom, 2, Oxygen) >= 0 || PartnerByOrder(m, atom, 2, Sulfur) >= 0);

    /// <summary>True when a halogen (F, Cl, Br, I).</summary>
    public static bool IsHalogen(int z) => z is 9 or 17 or 35 or 53;
}
