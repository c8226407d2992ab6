using ConsistencyHost.Chemistry.Model;
using ConsistencyHost.Spectra.Model;

namespace ConsistencyHost.Sdk.Entries;

/// <summary>
/// What a rule sees of an entry: read-only, already parsed, the same for every rule. Perception results
/// are computed lazily by the host and shared between rules.
/// </summary>
public interface IEntryView
{
    /// <summary>The notebook's id of the entry.</summary>
    string EntryId { get; }

    /// <summary>The claimed structure as submitted; null when the entry has none.</summary>
    StructureSource? Structure { get; }

    /// <summary>The structure as read; null when the entry has none.</summary>
    Molecule? Molecule { get; }

    /// <summary>Perception of <see cref="Molecule"/> (formula, classes); null when the entry has no structure.</summary>
    StructurePerception? Perception { get; }

    /// <summary>Every spectrum of the entry, in entry order (structured first, then read from text).</summary>
    IReadOnlyList<Spectrum> Spectra { get; }

    /// <summary>Claims beside the spectra (formula, HRMS).</summary>
    EntryClaims Claims { get; }

    /// <summary>Shared analyses of the spectra against the structure (1H interpretation and assignment).</summary>
    EntryAnalysis Analysis { get; }
}
