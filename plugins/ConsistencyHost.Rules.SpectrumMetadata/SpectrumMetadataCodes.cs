namespace ConsistencyHost.Rules.SpectrumMetadata;

/// <summary>The stable finding codes of the spectrum-metadata rule.</summary>
public static class SpectrumMetadataCodes
{
    /// <summary>A spectrum does not state its solvent.</summary>
    public const string SolventNotStated = "solvent-not-stated";

    /// <summary>A spectrum does not state its observe frequency.</summary>
    public const string FrequencyNotStated = "frequency-not-stated";

    /// <summary>A spectrum does not state its temperature (only when the profile asks for it).</summary>
    public const string TemperatureNotStated = "temperature-not-stated";

    /// <summary>A stated frequency is outside what NMR magnets deliver for that nucleus.</summary>
    public const string FrequencyImplausible = "frequency-implausible";

    /// <summary>The frequencies of two nuclei do not belong to one magnet.</summary>
    public const string FrequencyMismatch = "frequency-mismatch";
}
