namespace ConsistencyHost.Spectra.Nmredata;

/// <summary>One problem in an NMReDATA SD text.</summary>
/// <param name="Line">1-based line number in the SD text.</param>
/// <param name="Fragment">The text at fault, at most 30 characters.</param>
/// <param name="Expected">What was expected (a <see cref="NmredataMessages"/> constant).</param>
/// <param name="Message">A full sentence combining line, fragment and expectation.</param>
/// <param name="Severity">Error when data could not be read; warning for a recommendation not followed.</param>
public sealed record NmredataProblem(int Line, string Fragment, string Expected, string Message, ProblemSeverity Severity);
