using ConsistencyHost.Spectra.Model;

namespace ConsistencyHost.Spectra.Reported;

/// <summary>What <see cref="ReportedTextReader"/> read: spectra, HRMS claims and every problem.</summary>
public sealed record ReportedTextResult
{
    /// <summary>The spectra in the order of their headers (empty in strict mode when there was an error).</summary>
    public IReadOnlyList<Spectrum> Spectra { get; init; } = [];

    /// <summary>The HRMS claims in the order written (empty in strict mode when there was an error).</summary>
    public IReadOnlyList<HrmsClaim> Hrms { get; init; } = [];

    /// <summary>Non-NMR prose (Rf, mp, IR, yield …) skipped on purpose in lenient mode, in text order.</summary>
    public IReadOnlyList<SkippedText> Skipped { get; init; } = [];

    /// <summary>Every problem, in text order.</summary>
    public IReadOnlyList<ReportedTextProblem> Problems { get; init; } = [];

    /// <summary>True when no problem is an error.</summary>
    public bool Succeeded => Problems.All(p => p.Severity != ProblemSeverity.Error);
}
