namespace ConsistencyHost.Engine.Vetting;

/// <summary>The outcome of vetting one plugin: accepted when there is no problem.</summary>
public sealed record VettingResult(IReadOnlyList<VettingProblem> Problems)
{
    /// <summary>An accepted plugin.</summary>
    public static VettingResult Accepted { get; } = new([]);

    /// <summary>True when the plugin may be loaded.</summary>
    public bool IsAccepted => Problems.Count == 0;

    /// <summary>Every problem, one after another, for a refused plugin's load message.</summary>
    public string Reason => string.Join("; ", Problems);
}
