namespace ConsistencyHost.Spectra.Jcamp;

/// <summary>One problem in a JCAMP-DX text.</summary>
/// <param name="Line">1-based line number.</param>
/// <param name="Column">1-based column where the fault starts.</param>
/// <param name="Fragment">The text at fault, at most 30 characters.</param>
/// <param name="Expected">What was expected (a <see cref="JcampMessages"/> constant).</param>
/// <param name="Message">A full sentence combining position, fragment and expectation.</param>
/// <param name="Severity">Error when data could not be read as written; warning when a part was skipped on purpose.</param>
public sealed record JcampProblem(int Line, int Column, string Fragment, string Expected, string Message, ProblemSeverity Severity);
