namespace ConsistencyHost.Sdk.Testing.Running;

/// <summary>How a rule run ended, with the host's meanings.</summary>
public enum RuleRunStatus
{
    /// <summary>The rule returned its findings.</summary>
    Ok = 1,
    /// <summary>The rule threw.</summary>
    Failed = 2,
    /// <summary>The rule did not finish by its deadline.</summary>
    TimedOut = 3,
}
