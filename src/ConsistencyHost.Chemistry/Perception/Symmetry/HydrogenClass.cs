using System.Collections.Immutable;

namespace ConsistencyHost.Chemistry.Perception.Symmetry;

/// <summary>One set of NMR-equivalent hydrogens (homotopic or enantiotopic to each other).</summary>
/// <param name="Index">Position in <see cref="NmrEquivalence.HydrogenClasses"/>.</param>
/// <param name="ParentAtoms">Heavy-atom index of each hydrogen, sorted; an index repeats once per H.</param>
/// <param name="IsExchangeable">O–H, N–H or S–H.</param>
/// <param name="IsDiastereotopic">One of the two classes from a CH2 (or =CH2) whose protons are diastereotopic.</param>
/// <param name="Geminal2J">Hydrogen classes two bonds away (same parent atom).</param>
/// <param name="Vicinal3J">Hydrogen classes three bonds away.</param>
/// <param name="LongRange4J">Hydrogen classes four bonds away through a double or aromatic bond (allylic, meta).</param>
/// <param name="HeteronuclearNeighbours">19F and 31P atoms within three bonds of these hydrogens.</param>
public sealed record HydrogenClass(
    int Index,
    ImmutableArray<int> ParentAtoms,
    bool IsExchangeable,
    bool IsDiastereotopic,
    ImmutableArray<int> Geminal2J,
    ImmutableArray<int> Vicinal3J,
    ImmutableArray<int> LongRange4J,
    ImmutableArray<int> HeteronuclearNeighbours);

/// <summary>An expected number of signals: a range with the reasons it is not a single number.</summary>
/// <param name="Min">Fewest signals consistent with the structure.</param>
/// <param name="Max">Most signals consistent with the structure.</param>
/// <param name="Reasons">Why Min and Max differ (empty when they are equal).</param>
public sealed record SignalCountRange(int Min, int Max, IReadOnlyList<string> Reasons);
