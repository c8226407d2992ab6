namespace ConsistencyHost.Spectra.Analysis.Assignment;

/// <summary>
/// One hydrogen class as the assignment solver sees it: how many protons it holds and how many protons it
/// may couple to. Built from the structure's stereo-aware classes; the solver knows nothing else of them.
/// </summary>
/// <param name="Size">Number of protons in the class (3 for a CH3).</param>
/// <param name="IsExchangeable">O–H, N–H or S–H: may be absent from a spectrum.</param>
/// <param name="TypicalCoupledProtons">
/// Protons a first-order multiplet of this class is normally split by: vicinal partners outside the class
/// plus a diastereotopic geminal partner. A singlet for a class with partners costs a little.
/// </param>
/// <param name="MaxCoupledProtons">
/// The most protons (and spin-½ heteronuclei) it can be split by: the typical ones plus exchangeable vicinal
/// partners, long-range (4J) partners and F/P neighbours. A pattern implying more is impossible.
/// </param>
/// <param name="Source">The structure's hydrogen class this input stands for (-1 when built by hand); two
/// inputs share a source when slow exchange splits one class.</param>
public sealed record ClassInput(int Size, bool IsExchangeable, int TypicalCoupledProtons, int MaxCoupledProtons, int Source = -1)
{
    /// <summary>Same size, exchangeability and coupling numbers: interchangeable for the solver.</summary>
    public bool IsInterchangeableWith(ClassInput other) =>
        Size == other.Size && IsExchangeable == other.IsExchangeable
        && TypicalCoupledProtons == other.TypicalCoupledProtons && MaxCoupledProtons == other.MaxCoupledProtons;
}

/// <summary>One reported 1H signal as the solver sees it.</summary>
/// <param name="ProtonCount">The reported proton count (integral rounded to a whole number).</param>
/// <param name="ImpliedCoupledProtons">
/// Protons a first-order pattern implies (sum over its splittings of lines − 1: t → 2, dd → 2, dq → 4,
/// s → 0); null when the pattern constrains nothing (m, br, app, second-order labels, not given).
/// </param>
public sealed record SignalInput(int ProtonCount, int? ImpliedCoupledProtons);

/// <summary>Weights and limits of the search; defaults documented in docs/rules.</summary>
public sealed record AssignmentOptions
{
    /// <summary>The defaults.</summary>
    public static AssignmentOptions Default { get; } = new();

    /// <summary>Cost of leaving a non-exchangeable class unassigned (its protons are nowhere).</summary>
    public double MissingClassCost { get; init; } = 4;

    /// <summary>Cost per proton by which a signal's classes miss its reported count.</summary>
    public double CountMismatchCost { get; init; } = 3;

    /// <summary>Cost of a first-order pattern implying more partners than the class can have.</summary>
    public double ImpossiblePatternCost { get; init; } = 2;

    /// <summary>Cost of a singlet (or too simple a pattern) for a class that normally shows splitting.</summary>
    public double UnsplitPatternCost { get; init; } = 0.5;

    /// <summary>Search nodes before the solver settles for the best assignment found so far.</summary>
    public int NodeBudget { get; init; } = 250_000;
}

/// <summary>The best assignment found.</summary>
/// <param name="ClassesBySignal">For each signal, the indices of the classes assigned to it.</param>
/// <param name="MissingClasses">Classes assigned to no signal (exchangeable ones are free to be missing).</param>
/// <param name="Cost">Total cost; 0 for a fully consistent assignment.</param>
/// <param name="IsConsistent">
/// Every signal's count is made exactly by its classes, every non-exchangeable class is placed, and no
/// pattern is impossible for its classes.
/// </param>
/// <param name="IsExhaustive">False when the node budget ran out: a better assignment may exist.</param>
public sealed record AssignmentResult(
    IReadOnlyList<IReadOnlyList<int>> ClassesBySignal,
    IReadOnlyList<int> MissingClasses,
    double Cost,
    bool IsConsistent,
    bool IsExhaustive);
