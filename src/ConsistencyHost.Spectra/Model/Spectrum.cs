namespace ConsistencyHost.Spectra.Model;

/// <summary>One reported one-dimensional spectrum: acquisition facts plus its peak list.</summary>
public sealed record Spectrum
{
    /// <summary>The observed nucleus.</summary>
    public Nucleus Nucleus { get; init; }

    /// <summary>Observe frequency in MHz (400 for a 400 MHz 1H spectrum, 101 for its 13C); null when not stated.</summary>
    public double? FrequencyMHz { get; init; }

    /// <summary>Solvent, normalised ("CDCl3", "DMSO-d6"); null when not stated.</summary>
    public string? Solvent { get; init; }

    /// <summary>Temperature in kelvin; null when not stated.</summary>
    public double? TemperatureK { get; init; }

    /// <summary>The reported signals in the order given.</summary>
    public IReadOnlyList<Signal> Signals { get; init; } = [];

    /// <summary>Decoupled nucleus when stated ("1H" for 13C{1H}); null otherwise.</summary>
    public string? Decoupled { get; init; }

    /// <summary>
    /// Notes about the whole spectrum as written in its header or after its list ("rotamers 6:4", "major Z isomer",
    /// "OH not observed"); empty when none.
    /// </summary>
    public IReadOnlyList<string> Notes { get; init; } = [];

    /// <summary>Character offset of the spectrum's header in the source text, when read from text.</summary>
    public int? SourceOffset { get; init; }
}
