namespace ConsistencyHost.Spectra.Jcamp;

/// <summary>Collects JCAMP-DX problems with line and column.</summary>
internal sealed class JcampProblemSink
{
    private readonly List<JcampProblem> problems = [];

    public IReadOnlyList<JcampProblem> Problems => problems;

    public void Add(int line, int column, string fragment, string expected, ProblemSeverity severity = ProblemSeverity.Error)
    {
        var clipped = fragment.Trim();
        if (clipped.Length > 30) clipped = clipped[..30];
        problems.Add(new(line, column, clipped, expected, JcampMessages.Describe(line, column, clipped, expected), severity));
    }

    public void AddMessage(int line, int column, string fragment, string expected, string message) =>
        problems.Add(new(line, column, fragment, expected, message, ProblemSeverity.Error));
}
