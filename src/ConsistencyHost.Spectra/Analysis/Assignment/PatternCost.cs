namespace ConsistencyHost.Spectra.Analysis.Assignment;

/// <summary>How well a reported first-order pattern fits one hydrogen class (n+1 rule with tolerance).</summary>
/// <remarks>
/// A pattern implying k coupled protons fits a class whose partners number at least k (unresolved couplings
/// are common, so fewer lines than partners is fine) — except that a singlet for a class with vicinal
/// partners costs a little: it happens (near-zero J, fast exchange) but is worth a look. A pattern implying
/// more partners than the class can have is impossible under first-order rules. Common practice; see
/// nmr-methods notes §3.4 for the n+1 rule.
/// </remarks>
internal static class PatternCost
{
    public static double Of(ClassInput group, SignalInput signal, AssignmentOptions options)
    {
        if (signal.ImpliedCoupledProtons is not { } implied)
        {
            return 0;
        }

        if (implied > group.MaxCoupledProtons)
        {
            return options.ImpossiblePatternCost;
        }

        return implied == 0 && group.TypicalCoupledProtons > 0 ? options.UnsplitPatternCost : 0;
    }
}
