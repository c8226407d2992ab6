namespace ConsistencyHost.Sdk.Findings;

/// <summary>How serious a finding is. A profile may override the severity a rule proposes.</summary>
public enum Severity
{
    /// <summary>Worth knowing; no action required.</summary>
    Info = 1,
    /// <summary>Likely a problem; a chemist should look.</summary>
    Warning = 2,
    /// <summary>The data contradict the structure or the claims.</summary>
    Error = 3,
}
