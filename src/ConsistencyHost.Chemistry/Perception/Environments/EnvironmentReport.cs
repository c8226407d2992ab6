using ConsistencyHost.Chemistry.Model;
using ConsistencyHost.Chemistry.Perception.Formula;
using ConsistencyHost.Chemistry.Perception.Symmetry;

namespace ConsistencyHost.Chemistry.Perception.Environments;

/// <summary>What the CLI prints for a structure: formula, masses, classes and expected signal counts.</summary>
/// <param name="Formula">Hill formula with charge.</param>
/// <param name="MonoisotopicMass">Monoisotopic mass of the species, u (electron-corrected for charge).</param>
/// <param name="AverageMass">Average mass from CIAAW conventional weights.</param>
/// <param name="HeavyAtomClasses">Constitutional orbits of all (heavy) atoms, each sorted; ordered by smallest index.</param>
/// <param name="CarbonClasses13C">Stereo-aware carbon classes, same form.</param>
/// <param name="HydrogenClasses">Stereo-aware hydrogen classes: sorted parent atom indices, repeated once per H.</param>
/// <param name="Expected1H">Expected 1H signal count.</param>
/// <param name="Expected13C">Expected 13C signal count.</param>
/// <remarks>Atom indices are 0-based in input order of the atoms kept in the molecule: plain explicit hydrogens
/// (SMILES [H], molfile H atoms) are folded into their heavy atom and not indexed, so molfile atom numbers are
/// renumbered densely skipping those hydrogens.</remarks>
public sealed record EnvironmentReport(
    string Formula,
    double MonoisotopicMass,
    double AverageMass,
    IReadOnlyList<IReadOnlyList<int>> HeavyAtomClasses,
    IReadOnlyList<IReadOnlyList<int>> CarbonClasses13C,
    IReadOnlyList<IReadOnlyList<int>> HydrogenClasses,
    SignalCountRange Expected1H,
    SignalCountRange Expected13C)
{
    /// <summary>Describes a molecule.</summary>
    public static EnvironmentReport Describe(Molecule molecule)
    {
        var formula = MolecularFormula.Of(molecule);
        var nmr = NmrEquivalence.Of(molecule);
        return new EnvironmentReport(
            formula.Hill,
            formula.MonoisotopicMass,
            formula.AverageMass,
            [.. nmr.Constitutional.Classes.Select(c => (IReadOnlyList<int>)[.. c])],
            [.. nmr.CarbonClasses13C.Select(c => (IReadOnlyList<int>)[.. c])],
            [.. nmr.HydrogenClasses.Select(c => (IReadOnlyList<int>)[.. c.ParentAtoms])],
            nmr.Expected1H,
            nmr.Expected13C);
    }
}
