namespace ConsistencyHost.Spectra.Solvents;

/// <summary>Match windows for residual solvent, water and impurity lines.</summary>
/// <remarks>
/// Defaults derived in the reference notes from Gottlieb 1997: solvent and C–H impurity lines move little
/// (±0.03 ppm 1H, ±0.3 ppm 13C); water moves with hydrogen-bond acceptors, most in non-polar solvents (±0.3 ppm,
/// ±0.5 ppm in CDCl3, C6D6 and toluene-d8, ±0.15 ppm in DMSO-d6 where solutes hardly move it); HOD in D2O is
/// solute-independent but temperature-dependent (±0.05 ppm).
/// </remarks>
public sealed record ResidualMatchOptions
{
    /// <summary>The documented defaults.</summary>
    public static ResidualMatchOptions Default { get; } = new();

    /// <summary>Window for 1H residual-solvent and C–H impurity lines, ppm.</summary>
    public double ProtonWindowPpm { get; init; } = 0.03;

    /// <summary>Window for 13C solvent and impurity lines, ppm.</summary>
    public double CarbonWindowPpm { get; init; } = 0.3;

    /// <summary>Window for water and exchangeable impurity protons (OH, COOH), ppm.</summary>
    public double WaterWindowPpm { get; init; } = 0.3;

    /// <summary>Water window in the solvents where water moves most, ppm.</summary>
    public double WideWaterWindowPpm { get; init; } = 0.5;

    /// <summary>Solvents that get <see cref="WideWaterWindowPpm"/>.</summary>
    public IReadOnlyList<string> WideWaterSolvents { get; init; } = ["CDCl3", "C6D6", "toluene-d8"];

    /// <summary>
    /// Water window in DMSO-d6, ppm. DMSO already hydrogen-bonds water strongly, so solutes hardly move it
    /// (Gottlieb 1997: H2O 3.33, HDO 3.30); ±0.15 keeps temperature and acid/base drift (from memory: 3.3–3.4 ppm
    /// across typical samples) while no longer claiming a compound's O–CH or N–CH at 3.5–3.6 ppm as water.
    /// </summary>
    public double DmsoWaterWindowPpm { get; init; } = 0.15;

    /// <summary>Window for HOD in D2O, ppm.</summary>
    public double HodInD2OWindowPpm { get; init; } = 0.05;

    /// <summary>Groups of one impurity that must match before the impurity counts as present.</summary>
    public int MinimumImpurityGroups { get; init; } = 2;
}
