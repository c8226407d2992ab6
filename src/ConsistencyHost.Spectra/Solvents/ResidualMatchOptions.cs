namespace ConsistencyHost.Spectra.Solvents;

/// <summary>Match windows for residual solvent, water and impurity lines.</summary>
/// <remarks>
/// Defaults derived in the reference notes from Gottlieb 1997: solvent and C–H impurity lines move little
/// (±0.03 ppm 1H, ±0.3 ppm 13C); water moves downfield with hydrogen-bond acceptors, most in non-polar solvents,
/// hardly in DMSO-d6, and HOD in D2O only with temperature — one window per solvent in <see cref="WaterWindowTable"/>.
/// </remarks>
public sealed record ResidualMatchOptions
{
    /// <summary>The documented defaults.</summary>
    public static ResidualMatchOptions Default { get; } = new();

    /// <summary>Window for 1H residual-solvent and C–H impurity lines, ppm.</summary>
    public double ProtonWindowPpm { get; init; } = 0.03;

    /// <summary>Window for 13C solvent and impurity lines, ppm.</summary>
    public double CarbonWindowPpm { get; init; } = 0.3;

    /// <summary>Window for exchangeable impurity protons (the OH of an alcohol, the COOH of acetic acid), ppm.</summary>
    public double ExchangeableImpurityWindowPpm { get; init; } = 0.3;

    /// <summary>
    /// The water window of each canonical solvent (HOD in D2O included), each with its reason: the published value
    /// minus a small upfield and plus a solvent-specific downfield tolerance (<see cref="WaterWindowTable"/>).
    /// </summary>
    public IReadOnlyDictionary<string, ShiftWindow> WaterWindows { get; init; } = WaterWindowTable.All;

    /// <summary>Groups of one impurity that must match before the impurity counts as present.</summary>
    public int MinimumImpurityGroups { get; init; } = 2;
}
