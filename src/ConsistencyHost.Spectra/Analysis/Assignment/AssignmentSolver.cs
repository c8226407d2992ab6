namespace ConsistencyHost.Spectra.Analysis.Assignment;

/// <summary>
/// Finds the best assignment of hydrogen classes to reported 1H signals: every signal's proton count made
/// by the sizes of its classes, patterns that fit the classes' neighbours, exchangeable classes free to be
/// absent. Exact branch and bound over classes (largest first) with symmetry breaking between identical
/// classes and identical empty signals; instances from real entries (≤ ~40 classes) finish far inside the
/// node budget. When the budget runs out the best assignment so far is returned, marked not exhaustive.
/// </summary>
public static class AssignmentSolver
{
    /// <summary>Solves one instance.</summary>
    public static AssignmentResult Solve(IReadOnlyList<ClassInput> classes, IReadOnlyList<SignalInput> signals, AssignmentOptions? options = null) =>
        Solve(classes, signals, options, double.PositiveInfinity);

    /// <summary>
    /// Solves one instance looking only for assignments cheaper than <paramref name="upperBound"/> (a reading
    /// that cannot beat one already found is pruned early). When none is cheaper, the result has an infinite
    /// cost and is not consistent.
    /// </summary>
    public static AssignmentResult Solve(IReadOnlyList<ClassInput> classes, IReadOnlyList<SignalInput> signals, AssignmentOptions? options, double upperBound) =>
        Solve(classes, signals, options, upperBound, null);

    /// <summary>
    /// As <see cref="Solve(IReadOnlyList{ClassInput}, IReadOnlyList{SignalInput}, AssignmentOptions?, double)"/>, trying
    /// first, among equally good places for a class, the signal its predicted shift fits best
    /// (<paramref name="shiftCost"/>[class, signal], lower is better). The cost the search minimises is unchanged:
    /// shifts only order the search, so the first of several equally good assignments found is the shift-plausible
    /// one (then <see cref="ShiftPreference.Refine"/> mends what the order alone missed).
    /// </summary>
    public static AssignmentResult Solve(IReadOnlyList<ClassInput> classes, IReadOnlyList<SignalInput> signals, AssignmentOptions? options, double upperBound, double[,]? shiftCost)
    {
        ArgumentNullException.ThrowIfNull(classes);
        ArgumentNullException.ThrowIfNull(signals);
        var search = new AssignmentSearch(classes, signals, options ?? AssignmentOptions.Default, upperBound, shiftCost);
        return search.Run();
    }
}
