using ConsistencyHost.Spectra.Model;

namespace ConsistencyHost.Rules.SpectrumMetadata;

/// <summary>How the observe frequencies of different nuclei relate on one magnet.</summary>
internal static class MagnetFrequencies
{
    /// <summary>
    /// Frequency ratio Ξ of each nucleus to 1H (TMS scale, percent / 100).
    /// Source: Harris et al., "NMR nomenclature. Nuclear spin properties and conventions for chemical shifts",
    /// IUPAC Recommendations 2001, Pure Appl. Chem. 2001, 73, 1795 (Table 4); values from memory of that table:
    /// 13C 25.145020 %, 19F 94.094011 %, 31P 40.480742 %.
    /// </summary>
    public static double RatioToProton(Nucleus nucleus) => nucleus switch
    {
        Nucleus.H1 => 1.0,
        Nucleus.C13 => 0.25145020,
        Nucleus.F19 => 0.94094011,
        Nucleus.P31 => 0.40480742,
        _ => double.NaN,
    };

    /// <summary>
    /// The 1H frequency range of commercial NMR magnets, MHz: from 40 MHz benchtop instruments to
    /// 1.3 GHz high-field magnets (common practice; the 1.2 GHz class went into service in 2020).
    /// </summary>
    public const double LowestProtonMHz = 40;

    /// <inheritdoc cref="LowestProtonMHz"/>
    public const double HighestProtonMHz = 1300;
}
