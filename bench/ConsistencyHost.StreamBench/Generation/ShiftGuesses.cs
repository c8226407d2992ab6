using ConsistencyHost.Chemistry.Model;

namespace ConsistencyHost.StreamBench.Generation;

/// <summary>
/// Rough chemical shifts from an atom's immediate surroundings, good enough to make a peak list look like one:
/// invented demo data for load only, never a prediction. Base values and increments are rounded textbook
/// orders of magnitude. // From memory of Pretsch, Bühlmann, Badertscher, "Structure Determination of
/// Organic Compounds" (additivity tables), rounded.
/// </summary>
internal sealed class ShiftGuesses(Molecule molecule, IReadOnlyList<bool> aromatic)
{
    public double Proton(int parent, bool exchangeable)
    {
        var atom = molecule.Atoms[parent];
        if (exchangeable)
        {
            return atom.AtomicNumber switch
            {
                8 => NextToCarbonyl(parent) ? 11.2 : 2.4,
                7 => NextToCarbonyl(parent) ? 6.4 : 3.8,
                _ => 1.4,
            };
        }

        if (aromatic[parent]) return 7.45;
        if (HasMultipleBond(parent)) return IsCarbonyl(parent) ? 9.8 : 5.6;
        var baseShift = atom.HydrogenCount switch { 3 => 0.9, 2 => 1.3, _ => 1.6 };
        return baseShift + Neighbours(parent).Select(ProtonIncrement).DefaultIfEmpty(0).Max();
    }

    public double Carbon(int atom)
    {
        if (IsCarbonyl(atom)) return HasHeteroNeighbour(atom) ? 170.0 : 200.0;
        if (aromatic[atom]) return HasHeteroNeighbour(atom) ? 150.0 : 128.0;
        if (HasMultipleBond(atom)) return 125.0;
        var baseShift = molecule.Atoms[atom].HydrogenCount switch { 3 => 18.0, 2 => 28.0, 1 => 34.0, _ => 38.0 };
        return baseShift + Neighbours(atom).Select(n => molecule.Atoms[n].AtomicNumber switch { 8 => 40.0, 7 => 22.0, 17 or 35 => 20.0, _ => 0.0 }).DefaultIfEmpty(0).Max();
    }

    private double ProtonIncrement(int neighbour) => molecule.Atoms[neighbour].AtomicNumber switch
    {
        8 => 2.4,
        7 => 1.4,
        9 or 17 or 35 or 53 => 2.2,
        16 => 1.2,
        _ when aromatic[neighbour] || IsCarbonyl(neighbour) => 1.2,
        _ when HasMultipleBond(neighbour) => 0.8,
        _ => 0.0,
    };

    private IEnumerable<int> Neighbours(int atom) => molecule.Neighbours(atom).ToArray();

    private bool HasMultipleBond(int atom)
    {
        foreach (var b in molecule.BondsOf(atom)) if (molecule.Bonds[b].Order > 1) return true;
        return false;
    }

    private bool IsCarbonyl(int atom)
    {
        if (molecule.Atoms[atom].AtomicNumber != 6) return false;
        foreach (var b in molecule.BondsOf(atom))
        {
            var bond = molecule.Bonds[b];
            if (bond.Order == 2 && molecule.Atoms[bond.Other(atom)].AtomicNumber == 8) return true;
        }

        return false;
    }

    private bool NextToCarbonyl(int atom) => Neighbours(atom).Any(IsCarbonyl);

    private bool HasHeteroNeighbour(int atom) => Neighbours(atom).Any(n => molecule.Atoms[n].AtomicNumber is not 6 and not 1);
}
