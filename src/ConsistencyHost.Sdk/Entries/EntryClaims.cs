namespace ConsistencyHost.Sdk.Entries;

/// <summary>Claims that come with an entry beside its spectra.</summary>
public sealed record EntryClaims
{
    /// <summary>No claims.</summary>
    public static EntryClaims None { get; } = new();

    /// <summary>The molecular formula the entry states; null when none.</summary>
    public string? Formula { get; init; }
}
