namespace ConsistencyHost.Spectra.Reported;

/// <summary>Collects problems; the read mode decides their severity in one place.</summary>
internal sealed class ProblemSink(ReadMode mode)
{
    private readonly List<ReportedTextProblem> problems = [];

    public IReadOnlyList<ReportedTextProblem> Problems => problems;
    public ReadMode Mode => mode;

    /// <summary>Prose skipped on purpose in lenient mode.</summary>
    public List<SkippedText> Skipped { get; } = [];
    public int Count => problems.Count;

    public void Add(int offset, string fragment, string expected) =>
        problems.Add(new(offset, fragment, expected, ReportedTextMessages.Describe(offset, fragment, expected),
            mode == ReadMode.Strict ? ProblemSeverity.Error : ProblemSeverity.Warning));

    /// <summary>Limits are errors in both modes: the reader stopped reading.</summary>
    public void AddLimit(int offset, string fragment, string expected, string message) =>
        problems.Add(new(offset, fragment, expected, message, ProblemSeverity.Error));
}
