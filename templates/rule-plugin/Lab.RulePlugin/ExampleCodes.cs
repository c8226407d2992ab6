namespace Lab.RulePlugin;

/// <summary>The rule's stable finding codes; profiles override severities by these names.</summary>
public static class ExampleCodes
{
    /// <summary>A 1H spectrum lists fewer signals than the options ask for.</summary>
    public const string TooFewSignals = "too-few-signals";
}
