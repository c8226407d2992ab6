namespace ConsistencyHost.Spectra.Model;

/// <summary>
/// One reported signal (a line of a 13C list, a multiplet of a 1H list). A signal is either a point shift
/// (<see cref="ShiftPpm"/>) or a range (<see cref="RangeLowPpm"/>..<see cref="RangeHighPpm"/>), never neither.
/// </summary>
public sealed record Signal
{
    /// <summary>The shift in ppm when the signal was reported as one number.</summary>
    public double? ShiftPpm { get; init; }

    /// <summary>Lower end of a reported range in ppm.</summary>
    public double? RangeLowPpm { get; init; }

    /// <summary>Upper end of a reported range in ppm.</summary>
    public double? RangeHighPpm { get; init; }

    /// <summary>The multiplicity as reported ("s", "dd", "br s", "m"); empty when none was given.</summary>
    public string Multiplicity { get; init; } = "";

    /// <summary>Reported coupling constants, in the order they were written.</summary>
    public IReadOnlyList<Coupling> Couplings { get; init; } = [];

    /// <summary>Number of protons (1H: "2H") or a raw integral when no count was given.</summary>
    public double? ProtonCount { get; init; }

    /// <summary>Raw integral value (JCAMP-DX, NMReDATA E=) before any scaling to proton counts.</summary>
    public double? Integral { get; init; }

    /// <summary>Number of carbons a 13C line stands for ("(2C)"); null when not stated.</summary>
    public int? CarbonCount { get; init; }

    /// <summary>Assignment labels as reported ("H-3", "C=O", NMReDATA labels).</summary>
    public IReadOnlyList<string> Assignments { get; init; } = [];

    /// <summary>Free-text notes ("minor rotamer", "exchangeable with D2O", "overlapped").</summary>
    public IReadOnlyList<string> Notes { get; init; } = [];

    /// <summary>Where in the source text this signal was read (character offset), when read from text.</summary>
    public int? SourceOffset { get; init; }

    /// <summary>Number of observed nuclei a 19F or 31P signal stands for ("3F"); null when not stated.</summary>
    public int? NucleusCount { get; init; }

    /// <summary>Hydrogens attached to the carbon of a 13C signal (NMReDATA N= in 13C spectra, DEPT); null when not stated.</summary>
    public int? AttachedHydrogenCount { get; init; }

    /// <summary>Line width at half height in Hz (JCAMP-DX XYW tables, NMReDATA W=); null when not stated.</summary>
    public double? LineWidthHz { get; init; }

    /// <summary>The multiplicity text read as a pattern (flags, line counts, expected J count).</summary>
    public Multiplicity MultiplicityPattern => Model.Multiplicity.Parse(Multiplicity);

    /// <summary>A representative position: the shift, or the middle of the range.</summary>
    public double CentrePpm => ShiftPpm ?? ((RangeLowPpm ?? 0) + (RangeHighPpm ?? 0)) / 2.0;
}
