using ConsistencyHost.Spectra.Model;

namespace ConsistencyHost.Sdk.Testing.Entries;

/// <summary>Builds a structured spectrum signal by signal, as a test states a reported peak list.</summary>
public sealed class SpectrumBuilder
{
    private readonly List<Signal> _signals = [];
    private readonly Nucleus _nucleus;
    private readonly double? _mhz;
    private readonly string? _solvent;

    private SpectrumBuilder(Nucleus nucleus, double? mhz, string? solvent) => (_nucleus, _mhz, _solvent) = (nucleus, mhz, solvent);

    /// <summary>A 1H spectrum; pass null to leave frequency or solvent unstated.</summary>
    public static SpectrumBuilder Proton(double? mhz = 400, string? solvent = "CDCl3") => new(Nucleus.H1, mhz, solvent);

    /// <summary>A 13C spectrum.</summary>
    public static SpectrumBuilder Carbon(double? mhz = 101, string? solvent = "CDCl3") => new(Nucleus.C13, mhz, solvent);

    /// <summary>A 1H signal at one shift with its multiplicity, proton count and coupling constants (Hz) as reported.</summary>
    public SpectrumBuilder Signal(double ppm, string multiplicity, double? protons, params double[] couplingsHz)
    {
        _signals.Add(new Signal
        {
            ShiftPpm = ppm,
            Multiplicity = multiplicity,
            ProtonCount = protons,
            Couplings = [.. couplingsHz.Select(hz => new Coupling(hz))],
        });
        return this;
    }

    /// <summary>A signal reported as a range, e.g. "7.31–7.24 (m, 5H)".</summary>
    public SpectrumBuilder Range(double lowPpm, double highPpm, string multiplicity, double? protons)
    {
        _signals.Add(new Signal { RangeLowPpm = Math.Min(lowPpm, highPpm), RangeHighPpm = Math.Max(lowPpm, highPpm), Multiplicity = multiplicity, ProtonCount = protons });
        return this;
    }

    /// <summary>A 13C line.</summary>
    public SpectrumBuilder Line(double ppm)
    {
        _signals.Add(new Signal { ShiftPpm = ppm });
        return this;
    }

    /// <summary>The spectrum.</summary>
    public Spectrum Build() => new() { Nucleus = _nucleus, FrequencyMHz = _mhz, Solvent = _solvent, Signals = [.. _signals] };
}
