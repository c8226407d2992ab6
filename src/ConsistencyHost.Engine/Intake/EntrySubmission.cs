using ConsistencyHost.Sdk.Entries;
using ConsistencyHost.Spectra.Model;

namespace ConsistencyHost.Engine.Intake;

/// <summary>An entry as submitted, before intake has read its texts. Transport-neutral.</summary>
public sealed record EntrySubmission
{
    /// <summary>The notebook's id of the entry.</summary>
    public string EntryId { get; init; } = "";

    /// <summary>The structure as submitted; null when none.</summary>
    public StructureSource? Structure { get; init; }

    /// <summary>Spectra given one by one.</summary>
    public IReadOnlyList<SpectrumSubmission> Spectra { get; init; } = [];

    /// <summary>Free characterisation text blocks (NMR and HRMS lines).</summary>
    public IReadOnlyList<string> ReportedText { get; init; } = [];

    /// <summary>One NMReDATA SD record; null when none.</summary>
    public string? NmredataRecord { get; init; }

    /// <summary>The stated molecular formula; null when none.</summary>
    public string? Formula { get; init; }

    /// <summary>HRMS claims sent structured (claims read from reported text are added by intake).</summary>
    public IReadOnlyList<HrmsClaim> Hrms { get; init; } = [];

    /// <summary>The profile to apply; null or empty for the default.</summary>
    public string? Profile { get; init; }

    /// <summary>
    /// True refuses the entry when any fragment of reported text cannot be read; false (the default) reports each
    /// such fragment as a finding and checks the rest.
    /// </summary>
    public bool StrictText { get; init; }

    /// <summary>
    /// The id of the call that brought the entry (the host's x-request-id), for traces; null when the entry did not
    /// come through a host. Not part of the entry: it changes no check.
    /// </summary>
    public string? RequestId { get; init; }
}

/// <summary>One spectrum as submitted: acquisition facts plus exactly one data form.</summary>
public sealed record SpectrumSubmission
{
    /// <summary>Nucleus label as given ("1H", "13C").</summary>
    public string? Nucleus { get; init; }

    /// <summary>Observe frequency, MHz.</summary>
    public double? FrequencyMHz { get; init; }

    /// <summary>Solvent as written.</summary>
    public string? Solvent { get; init; }

    /// <summary>Temperature, K.</summary>
    public double? TemperatureK { get; init; }

    /// <summary>Structured signals, when the notebook sends them parsed.</summary>
    public IReadOnlyList<Signal>? Signals { get; init; }

    /// <summary>The reported text of this spectrum.</summary>
    public string? ReportedText { get; init; }

    /// <summary>A JCAMP-DX document.</summary>
    public string? JcampDx { get; init; }
}
