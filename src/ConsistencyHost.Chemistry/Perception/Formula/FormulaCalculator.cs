using System.Collections.Immutable;
using ConsistencyHost.Chemistry.Model;

namespace ConsistencyHost.Chemistry.Perception.Formula;

/// <summary>Counts atoms and sums masses of a molecule.</summary>
internal static class FormulaCalculator
{
    public static MolecularFormula Of(Molecule molecule)
    {
        var counts = new Dictionary<string, int>(StringComparer.Ordinal);
        double mono = 0, average = 0;
        var charge = 0;
        var hydrogen = Elements.ByAtomicNumber(1)!;
        foreach (var a in molecule.Atoms)
        {
            var e = Elements.ByAtomicNumber(a.AtomicNumber) ?? Elements.ByAtomicNumber(0)!;
            Add(counts, e.Symbol, 1);
            mono += a.Isotope == 0 ? e.MonoisotopicMass : Nuclides.MassOf(a.AtomicNumber, a.Isotope) ?? a.Isotope;
            average += a.Isotope == 0 ? e.ConventionalWeight : Nuclides.MassOf(a.AtomicNumber, a.Isotope) ?? a.Isotope;
            charge += a.Charge;
            if (a.HydrogenCount > 0)
            {
                Add(counts, "H", a.HydrogenCount);
                mono += a.HydrogenCount * hydrogen.MonoisotopicMass;
                average += a.HydrogenCount * hydrogen.ConventionalWeight;
            }
        }

        return new MolecularFormula(counts.ToImmutableSortedDictionary(StringComparer.Ordinal), charge, mono, average);
    }

    internal static MolecularFormula FromCounts(IReadOnlyDictionary<string, int> counts, int charge)
    {
        double mono = 0, average = 0;
        foreach (var (symbol, n) in counts)
        {
            var e = Elements.FromSymbol(symbol)!;
            mono += n * e.MonoisotopicMass;
            average += n * e.ConventionalWeight;
        }

        return new MolecularFormula(counts.ToImmutableSortedDictionary(StringComparer.Ordinal), charge, mono, average);
    }

    private static void Add(Dictionary<string, int> counts, string symbol, int n) =>
        counts[symbol] = counts.GetValueOrDefault(symbol) + n;
}
