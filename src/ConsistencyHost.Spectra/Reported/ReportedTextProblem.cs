namespace ConsistencyHost.Spectra.Reported;

/// <summary>One problem found in reported text: where, what was there, what was expected.</summary>
/// <param name="Offset">Character offset in the input where the problem starts.</param>
/// <param name="Fragment">The text at fault, at most 30 characters (empty at the end of the text).</param>
/// <param name="Expected">What the reader expected at that point (a <see cref="ReportedTextMessages"/> constant).</param>
/// <param name="Message">A full sentence combining offset, fragment and expectation.</param>
/// <param name="Severity">Error in strict mode (and for limits), warning in lenient mode.</param>
public sealed record ReportedTextProblem(
    int Offset, string Fragment, string Expected, string Message, ProblemSeverity Severity);
