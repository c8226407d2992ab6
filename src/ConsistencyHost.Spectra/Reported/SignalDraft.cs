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
    public List<Coupling> Couplings { get; } = [];
    public double? ProtonCount { get; set; }
    public int? CarbonCount { get; set; }
    public int? NucleusCount { get; set; }
    public List<string> Assignments { get; } = [];
    public List<string> Notes { get; } = [];
    public bool HasDetails { get; set; }

    public bool HasCount => ProtonCount is not null || CarbonCount is not null || NucleusCount is not null;

    public Signal Build() => new()
    {
        ShiftPpm = Shift,
        RangeLowPpm = Low,
        RangeHighPpm = High,
        Multiplicity = Multiplicity ?? "",
        Couplings = [.. Couplings],
        ProtonCount = ProtonCount,
        CarbonCount = CarbonCount,
        NucleusCount = NucleusCount,
        Assignments = [.. Assignments],
        Notes = [.. Notes],
        SourceOffset = Offset,
    };
}
