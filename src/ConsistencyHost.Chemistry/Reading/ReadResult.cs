namespace ConsistencyHost.Chemistry.Reading;

/// <summary>Severity of a read problem.</summary>
public enum ProblemSeverity
{
    /// <summary>The input was read, but something was doubtful or repaired (lenient mode).</summary>
    Warning,
    /// <summary>The input could not be read correctly.</summary>
    Error,
}

/// <summary>One problem found while reading, with its position.</summary>
/// <param name="Severity">Error or warning.</param>
/// <param name="Message">What was found, where, and what was expected.</param>
/// <param name="Offset">0-based character offset (SMILES), or -1.</param>
/// <param name="Line">1-based line (molfile), or 0.</param>
/// <param name="Column">1-based column (molfile), or 0.</param>
/// <param name="AtomIndex">Atom concerned, when known.</param>
public sealed record ReadProblem(
    ProblemSeverity Severity,
    string Message,
    int Offset = -1,
    int Line = 0,
    int Column = 0,
    int? AtomIndex = null);

/// <summary>The outcome of reading: a value when it succeeded, and every problem found.</summary>
/// <typeparam name="T">What was read.</typeparam>
/// <param name="Value">The value; null when an error prevented reading.</param>
/// <param name="Problems">All problems in input order.</param>
public sealed record ReadResult<T>(T? Value, IReadOnlyList<ReadProblem> Problems)
    where T : class
{
    /// <summary>True when a value was produced and no problem is an error.</summary>
    public bool Succeeded => Value is not null && !Problems.Any(p => p.Severity == ProblemSeverity.Error);
}
