using ConsistencyHost.Spectra.Model;

namespace ConsistencyHost.Spectra.Reported;

/// <summary>A signal while it is being read; becomes an immutable <see cref="Signal"/> at the end.</summary>
internal sealed class SignalDraft(int offset, Nucleus nucleus)
{
    public int Offset { get; } = offset;
    public Nucleus Nucleus { get; } = nucleus;
    public double? Shift { get; set; }
    public double? Low { get; set; }
    public double? High { get; set; }
    public string? Multiplicity { get; set; }
    private List<Coupling>? couplings;
    private List<string>? assignments;
    private List<string>? notes;

    // Created on first use: most signals have no couplings, assignments or notes (allocation matters in the hot path).
    public List<Coupling> Couplings => couplings ??= [];
    public double? ProtonCount { get; set; }
    public int? CarbonCount { get; set; }
    public int? NucleusCount { get; set; }
    public List<string> Assignments => assignments ??= [];
    public List<string> Notes => notes ??= [];
    public bool HasNotes => notes is { Count: > 0 };
    public bool HasCouplings => couplings is { Count: > 0 };
    public bool HasDetails { get; set; }

    public bool HasCount => ProtonCount is not null || CarbonCount is not null || NucleusCount is not null;

    public Signal Build() => new()
    {
        ShiftPpm = Shift,
        RangeLowPpm = Low,
        RangeHighPpm = High,
        Multiplicity = Multiplicity ?? "",
        Couplings = couplings ?? (IReadOnlyList<Coupling>)[],
        ProtonCount = ProtonCount,
        CarbonCount = CarbonCount,
        NucleusCount = NucleusCount,
        Assignments = assignments ?? (IReadOnlyList<string>)[],
        Notes = notes ?? (IReadOnlyList<string>)[],
        SourceOffset = Offset,
    };
}
