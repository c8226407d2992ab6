namespace ConsistencyHost.Spectra.Nmredata;

/// <summary>Collects NMReDATA problems with their line numbers.</summary>
internal sealed class NmredataProblemSink
{
    private readonly List<NmredataProblem> problems = [];

    public IReadOnlyList<NmredataProblem> Problems => problems;

    public void Add(int line, string fragment, string expected, ProblemSeverity severity = ProblemSeverity.Error)
    {
        var clipped = fragment.Trim();
        if (clipped.Length > 30) clipped = clipped[..30];
        problems.Add(new(line, clipped, expected, NmredataMessages.Describe(line, clipped, expected), severity));
    }

    public void AddMessage(int line, string expected, string message) =>
        problems.Add(new(line, "", expected, message, ProblemSeverity.Error));
}
