using System.Collections.Concurrent;
using ConsistencyHost.Chemistry.Model;
using ConsistencyHost.Chemistry.Perception.Formula;
using ConsistencyHost.Chemistry.Smiles;

namespace ConsistencyHost.Spectra.Analysis.Interpretation;

/// <summary>
/// Whether a submitted structure is a tabulated impurity itself (so that, say, an entry for ethyl acetate is
/// not told that its own signals are an ethyl acetate impurity).
/// </summary>
/// <remarks>
/// Compared by formula and by the multiset of (element, hydrogen count, degree, charge) over heavy atoms.
/// Two different constitutions could share both, but not among the few dozen tabulated solvents; an exact
/// canonical comparison is not needed for this purpose.
/// </remarks>
public static class SameCompound
{
    // Each tabulated SMILES is read and summarised once per process; most submitted structures differ in atom
    // count from every tabulated solvent, so the formula is computed only when the counts agree.
    private static readonly ConcurrentDictionary<string, Molecule?> Parsed = new(StringComparer.Ordinal);

    /// <summary>True when <paramref name="molecule"/> is the compound written as <paramref name="smiles"/>.</summary>
    public static bool Is(Molecule molecule, string? smiles)
    {
        ArgumentNullException.ThrowIfNull(molecule);
        if (smiles is null) return false;
        var other = Parsed.GetOrAdd(smiles, s => SmilesReader.Read(s).Value);
        return other is not null
               && other.AtomCount == molecule.AtomCount
               && MolecularFormula.Of(molecule).Hill == MolecularFormula.Of(other).Hill
               && Signature(molecule).SequenceEqual(Signature(other));
    }

    private static IEnumerable<(int, int, int, int)> Signature(Molecule molecule) =>
        Enumerable.Range(0, molecule.AtomCount)
            .Select(a => (molecule.Atoms[a].AtomicNumber, molecule.Atoms[a].HydrogenCount, molecule.Degree(a), molecule.Atoms[a].Charge))
            .Order();
}
