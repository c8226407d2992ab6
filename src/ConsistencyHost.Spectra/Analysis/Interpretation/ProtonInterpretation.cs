using ConsistencyHost.Spectra.Analysis.Assignment;
using ConsistencyHost.Spectra.Solvents;

namespace ConsistencyHost.Spectra.Analysis.Interpretation;

/// <summary>
/// How a reported 1H list is best read against a structure: which signals belong to the compound, which are
/// residual solvent, water, an impurity or a minor species; the proton count of each signal; and the best
/// assignment of the structure's hydrogen classes to the compound's signals.
/// </summary>
public sealed record ProtonInterpretation
{
    /// <summary>The role of every reported signal, in reported order.</summary>
    public required IReadOnlyList<SignalRole> Roles { get; init; }

    /// <summary>Whole proton count per reported signal (stated, or fitted from raw integrals); null when unknown.</summary>
    public required IReadOnlyList<int?> ProtonCounts { get; init; }

    /// <summary>True when every counted signal has a proton count (stated or fitted).</summary>
    public bool CountsKnown => CompoundSignals.All(i => ProtonCounts[i] is not null);

    /// <summary>Indices of the signals taken as the compound's, in reported order.</summary>
    public required IReadOnlyList<int> CompoundSignals { get; init; }

    /// <summary>The structure's hydrogen classes as the solver saw them.</summary>
    public required IReadOnlyList<ClassInput> Classes { get; init; }

    /// <summary>
    /// Best assignment over <see cref="CompoundSignals"/> (its ClassesBySignal[k] belongs to CompoundSignals[k]);
    /// null when proton counts are unknown.
    /// </summary>
    public AssignmentResult? Assignment { get; init; }

    /// <summary>The integer fit of raw integrals, when counts came from integrals.</summary>
    public IntegralFit? IntegralFit { get; init; }

    /// <summary>True when the data read better with slow amide C–N rotation (N-substituents distinct).</summary>
    public bool SlowAmideRotation { get; init; }

    /// <summary>
    /// Stated proton count per signal, with the shares of the minor-rotamer signals paired with it added
    /// (<see cref="RotamerShares"/>); null where no count is stated.
    /// </summary>
    public IReadOnlyList<double?> StatedCounts { get; init; } = [];

    /// <summary>Minor-rotamer signal index → the compound signal whose environment it shares.</summary>
    public IReadOnlyDictionary<int, int> RotamerPairs { get; init; } = new Dictionary<int, int>();

    /// <summary>What the residual matcher found (all matches, before interpretation).</summary>
    public required ResidualMatchResult Residuals { get; init; }

    /// <summary>Protons reported for the compound: the sum of the compound signals' counts (0 when unknown).</summary>
    public int ReportedProtons => CompoundSignals.Sum(i => ProtonCounts[i] ?? 0);

    /// <summary>Protons in the structure.</summary>
    public int StructureProtons => Classes.Sum(c => c.Size);

    /// <summary>Protons in exchangeable classes (may be absent).</summary>
    public int ExchangeableProtons => Classes.Where(c => c.IsExchangeable).Sum(c => c.Size);
}
