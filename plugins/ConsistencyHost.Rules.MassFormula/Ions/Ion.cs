using ConsistencyHost.Chemistry.Perception.Formula;

namespace ConsistencyHost.Rules.MassFormula.Ions;

/// <summary>An ion with its atoms and charge, and its m/z by the HRMS convention.</summary>
/// <param name="Composition">The ion's atoms and their neutral-atom mass sum.</param>
/// <param name="Charge">Signed charge z.</param>
/// <remarks>
/// m/z = (Σ neutral-atom masses − z·mₑ) / |z|: a cation lacks z electrons, an anion carries |z| extra
/// (nmr-data-standards.md §7.3; NIST nuclide masses §7.1; mₑ CODATA 2018 §7.2).
/// </remarks>
internal sealed record Ion(Composition Composition, int Charge)
{
    /// <summary>m/z with the electron correction.</summary>
    public double Mz => (Composition.AtomMassSum - (Charge * MolecularFormula.ElectronMass)) / Math.Abs(Charge);

    /// <summary>m/z as an author gets it who forgets the electrons: the atom masses divided by |z|.</summary>
    public double MzWithoutElectron => Composition.AtomMassSum / Math.Abs(Charge);

    /// <summary>Hill formula with charge ("C8H11N4O2+").</summary>
    public string Hill => Composition.Hill(Charge);
}
