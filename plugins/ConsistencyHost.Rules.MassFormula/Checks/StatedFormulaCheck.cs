using ConsistencyHost.Chemistry.Model;
using ConsistencyHost.Chemistry.Perception.Formula;
using ConsistencyHost.Rules.MassFormula.Ions;
using ConsistencyHost.Sdk.Findings;

namespace ConsistencyHost.Rules.MassFormula.Checks;

/// <summary>The molecular formula an entry states, read and compared with the structure's formula.</summary>
internal static class StatedFormulaCheck
{
    /// <summary>Findings for the stated formula; the formula read (null when none or unreadable).</summary>
    public static (IReadOnlyList<Finding> Findings, MolecularFormula? Stated) Check(string? text, Molecule? molecule, MolecularFormula? structure)
    {
        if (text is null)
        {
            return ([], null);
        }

        var (stated, error) = MolecularFormula.Parse(text);
        if (stated is null)
        {
            var unreadable = new Finding(MassFormulaCodes.FormulaUnreadable, Severity.Warning,
                    $"The stated molecular formula '{text}' cannot be read: {error}")
                .WithEvidence("reported_formula", text);
            return ([unreadable], null);
        }

        return structure is null || molecule is null || Agrees(stated, structure) ? ([], stated) : ([Mismatch(text, stated, molecule, structure)], stated);
    }

    /// <summary>Same element counts; the charge only counts when the stated formula writes one.</summary>
    private static bool Agrees(MolecularFormula stated, MolecularFormula structure) =>
        Composition.Of(stated).SameCounts(Composition.Of(structure)) && (stated.Charge == 0 || stated.Charge == structure.Charge);

    private static Finding Mismatch(string text, MolecularFormula stated, Molecule molecule, MolecularFormula structure)
    {
        var differing = Composition.Of(stated).DifferingElements(Composition.Of(structure));
        var reference = MoleculeReference.FromStructure(molecule, structure);
        return new Finding(MassFormulaCodes.FormulaMismatch, Severity.Error,
                $"The stated molecular formula {stated.Hill} is not that of the structure, {structure.Hill} " +
                $"(monoisotopic mass {MassText.Mz(stated.MonoisotopicMass)} vs {MassText.Mz(structure.MonoisotopicMass)}).")
            {
                Atoms = reference.AtomsOf(differing),
            }
            .WithEvidence("expected_formula", structure.Hill)
            .WithEvidence("reported_formula", text)
            .WithEvidence("expected_mass", MassText.Mz(structure.MonoisotopicMass))
            .WithEvidence("reported_formula_mass", MassText.Mz(stated.MonoisotopicMass));
    }
}
