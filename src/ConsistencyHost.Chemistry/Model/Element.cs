namespace ConsistencyHost.Chemistry.Model;

/// <summary>One chemical element: symbol, the default valences used for implicit hydrogens, and masses.</summary>
/// <param name="AtomicNumber">Z.</param>
/// <param name="Symbol">IUPAC symbol, e.g. "Cl".</param>
/// <param name="DefaultValences">Ascending normal valences (OpenSMILES organic subset and the MDL valence model);
/// empty for elements that never receive implicit hydrogens.</param>
/// <param name="MostAbundantMassNumber">Mass number of the most abundant nuclide (used for the monoisotopic mass).</param>
/// <param name="MonoisotopicMass">Relative atomic mass of that nuclide, u.</param>
/// <param name="ConventionalWeight">Conventional (abridged) standard atomic weight.</param>
public sealed record Element(
    int AtomicNumber,
    string Symbol,
    IReadOnlyList<int> DefaultValences,
    int MostAbundantMassNumber,
    double MonoisotopicMass,
    double ConventionalWeight);
