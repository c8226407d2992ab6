using ConsistencyHost.Spectra.Model;

namespace ConsistencyHost.Spectra.Solvents;

/// <summary>A common laboratory impurity with its structure and tabulated groups.</summary>
/// <param name="Name">Common name as in the source tables ("ethyl acetate").</param>
/// <param name="Smiles">Structure as SMILES, so a submitted compound that is a common solvent can be recognised; null for mixtures (grease).</param>
/// <param name="Groups">The groups with their tabulated shifts.</param>
public sealed record Impurity(string Name, string? Smiles, IReadOnlyList<ImpurityGroup> Groups);

/// <summary>One chemically distinct group of an impurity.</summary>
/// <param name="Label">Group as tabulated ("CH3", "OCH2", "C=O", "H-2/6").</param>
/// <param name="ProtonCount">Protons in the group implied by the structure (0 for a carbon-only row); null when variable (grease).</param>
/// <param name="Multiplicity">Tabulated 1H multiplicity ("s", "t", "q", "m"); empty for carbon-only rows.</param>
/// <param name="JHz">Tabulated J to the nearest hertz ("t, 7"); null when none.</param>
/// <param name="Exchangeable">OH/NH/COOH: shift depends on concentration and water, match with the wide window.</param>
/// <param name="Shifts">Tabulated shifts per solvent and nucleus, each with its source.</param>
public sealed record ImpurityGroup(
    string Label, int? ProtonCount, string Multiplicity, int? JHz, bool Exchangeable, IReadOnlyList<ImpurityShift> Shifts);

/// <summary>One tabulated shift of an impurity group.</summary>
public sealed record ImpurityShift(string Solvent, Nucleus Nucleus, double Ppm, DataSource Source);
