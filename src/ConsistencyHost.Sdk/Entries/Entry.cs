using ConsistencyHost.Spectra.Model;

namespace ConsistencyHost.Sdk.Entries;

/// <summary>An immutable entry, as the host hands it to rules and as the test kit builds it.</summary>
public sealed record Entry : IEntryView
{
    /// <inheritdoc />
    public required string EntryId { get; init; }

    /// <inheritdoc />
    public StructureSource? Structure { get; init; }

    /// <inheritdoc />
    public IReadOnlyList<Spectrum> Spectra { get; init; } = [];

    /// <inheritdoc />
    public EntryClaims Claims { get; init; } = EntryClaims.None;
}
