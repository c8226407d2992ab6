using ConsistencyHost.Chemistry.Model;
using ConsistencyHost.Spectra.Model;

namespace ConsistencyHost.Sdk.Entries;

/// <summary>An immutable entry, as the host hands it to rules and as the test kit builds it.</summary>
public sealed record Entry : IEntryView
{
    private StructurePerception? _perception;
    private EntryAnalysis? _analysis;

    /// <inheritdoc />
    public required string EntryId { get; init; }

    /// <inheritdoc />
    public StructureSource? Structure { get; init; }

    /// <inheritdoc />
    public Molecule? Molecule { get; init; }

    /// <inheritdoc />
    /// <remarks>Created on first use for the current <see cref="Molecule"/>; a copy made with <c>with</c> and
    /// another molecule gets its own.</remarks>
    public StructurePerception? Perception
    {
        get
        {
            if (Molecule is null) return null;
            var current = Volatile.Read(ref _perception);
            if (current is not null && ReferenceEquals(current.Molecule, Molecule)) return current;
            var created = new StructurePerception(Molecule);
            var raced = Interlocked.CompareExchange(ref _perception, created, current);
            return ReferenceEquals(raced, current) ? created : raced!;
        }
    }

    /// <inheritdoc />
    public IReadOnlyList<Spectrum> Spectra { get; init; } = [];

    /// <inheritdoc />
    public EntryClaims Claims { get; init; } = EntryClaims.None;

    /// <inheritdoc />
    /// <remarks>Created on first use for the current spectra and structure, like <see cref="Perception"/>.</remarks>
    public EntryAnalysis Analysis
    {
        get
        {
            var perception = Perception;
            var current = Volatile.Read(ref _analysis);
            if (current is not null && ReferenceEquals(current.Spectra, Spectra) && ReferenceEquals(current.Perception, perception)) return current;
            var created = new EntryAnalysis(Spectra, perception);
            var raced = Interlocked.CompareExchange(ref _analysis, created, current);
            return ReferenceEquals(raced, current) ? created : raced!;
        }
    }
}
