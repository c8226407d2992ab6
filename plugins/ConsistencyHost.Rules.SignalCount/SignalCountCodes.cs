namespace ConsistencyHost.Rules.SignalCount;

/// <summary>The stable finding codes of the signal-count rule.</summary>
public static class SignalCountCodes
{
    /// <summary>More 1H signals than the structure's environments can give.</summary>
    public const string TooManyProtonSignals = "too-many-1h-signals";

    /// <summary>Fewer 1H signals than the structure needs, and the integrals do not explain the overlap.</summary>
    public const string TooFewProtonSignals = "too-few-1h-signals";

    /// <summary>More 13C lines than the structure has carbon environments.</summary>
    public const string TooManyCarbonSignals = "too-many-13c-signals";

    /// <summary>Fewer 13C lines than carbon environments, without (nC) annotations to explain it.</summary>
    public const string TooFewCarbonSignals = "too-few-13c-signals";
}
