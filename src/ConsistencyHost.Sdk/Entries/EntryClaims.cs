using ConsistencyHost.Spectra.Model;

namespace ConsistencyHost.Sdk.Entries;

/// <summary>Claims that come with an entry beside its spectra.</summary>
public sealed record EntryClaims
{
    /// <summary>No claims.</summary>
    public static EntryClaims None { get; } = new();

    /// <summary>The molecular formula the entry states; null when none.</summary>
    public string? Formula { get; init; }

    /// <summary>HRMS claims, structured or read from reported text, in entry order.</summary>
    public IReadOnlyList<HrmsClaim> Hrms { get; init; } = [];
}
