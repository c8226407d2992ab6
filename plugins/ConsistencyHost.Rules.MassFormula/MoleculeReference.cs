using ConsistencyHost.Chemistry.Model;
using ConsistencyHost.Chemistry.Perception.Formula;
using ConsistencyHost.Rules.MassFormula.Ions;

namespace ConsistencyHost.Rules.MassFormula;

/// <summary>
/// What M is for the HRMS checks: the structure's formula, or — when the entry has no structure — the
/// stated molecular formula.
/// </summary>
/// <param name="Composition">M's atoms and neutral-atom mass.</param>
/// <param name="Charge">M's net charge.</param>
/// <param name="Description">How messages name M: "the structure (C8H10N4O2)".</param>
/// <param name="Molecule">The structure, for atom indices; null when M comes from the stated formula.</param>
internal sealed record MoleculeReference(Composition Composition, int Charge, string Description, Molecule? Molecule)
{
    /// <summary>M from the structure.</summary>
    public static MoleculeReference FromStructure(Molecule molecule, MolecularFormula formula) =>
        new(Composition.Of(formula), formula.Charge, $"the structure ({formula.Hill})", molecule);

    /// <summary>M from the stated formula.</summary>
    public static MoleculeReference FromStatedFormula(MolecularFormula formula) =>
        new(Composition.Of(formula), formula.Charge, $"the stated formula ({formula.Hill})", null);

    /// <summary>Indices of the structure's atoms of the given elements; empty without a structure.</summary>
    public IReadOnlyList<int> AtomsOf(IReadOnlySet<string> elements)
    {
        if (Molecule is null) return [];
        var atoms = new List<int>();
        for (var i = 0; i < Molecule.AtomCount; i++)
        {
            if (elements.Contains(Molecule.Atoms[i].Symbol)) atoms.Add(i);
        }

        return atoms;
    }
}
