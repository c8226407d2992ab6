namespace ConsistencyHost.Spectra.Solvents;

/// <summary>What a reported signal was matched to.</summary>
public enum ResidualMatchKind
{
    /// <summary>The residual solvent line (or the solvent's own 13C line).</summary>
    ResidualSolvent,
    /// <summary>Water / HOD.</summary>
    Water,
    /// <summary>A group of a common impurity.</summary>
    Impurity,
}

/// <summary>One signal matched to a tabulated line.</summary>
/// <param name="SignalIndex">Index of the signal in the list that was matched.</param>
/// <param name="Kind">Residual solvent, water or impurity.</param>
/// <param name="Name">Solvent name, or impurity name.</param>
/// <param name="Group">Impurity group label or residual species.</param>
/// <param name="ReferencePpm">Tabulated shift.</param>
/// <param name="DeviationPpm">Signal centre minus tabulated shift (0 when a reported range contains it).</param>
/// <param name="Source">Where the tabulated shift comes from.</param>
public sealed record ResidualMatch(
    int SignalIndex, ResidualMatchKind Kind, string Name, string Group, double ReferencePpm, double DeviationPpm, DataSource Source);

/// <summary>How much of one impurity was found.</summary>
/// <param name="Impurity">The impurity.</param>
/// <param name="MatchedGroups">Groups with at least one matching signal.</param>
/// <param name="TabulatedGroups">Groups with a tabulated shift for this solvent and nucleus.</param>
/// <param name="MeetsMinimum">True when <paramref name="MatchedGroups"/> reaches <see cref="ResidualMatchOptions.MinimumImpurityGroups"/>.</param>
public sealed record ImpurityEvidence(Impurity Impurity, int MatchedGroups, int TabulatedGroups, bool MeetsMinimum)
{
    /// <summary>True when two or more groups of the impurity match.</summary>
    public bool TwoOrMoreGroups => MatchedGroups >= 2;
}

/// <summary>Every match for one spectrum.</summary>
public sealed record ResidualMatchResult
{
    /// <summary>False when the solvent is missing or has no tabulated lines; nothing was matched then.</summary>
    public bool SolventKnown { get; init; }

    /// <summary>Matches in signal order.</summary>
    public IReadOnlyList<ResidualMatch> Matches { get; init; } = [];

    /// <summary>Impurities with at least one matching group.</summary>
    public IReadOnlyList<ImpurityEvidence> Impurities { get; init; } = [];
}
