namespace ConsistencyHost.Rules.SolventResidual;

/// <summary>The stable finding codes of the solvent-residual rule.</summary>
public static class SolventResidualCodes
{
    /// <summary>The residual protio-solvent line (or the solvent's 13C line) listed as a compound signal.</summary>
    public const string ResidualSolventReported = "residual-solvent-reported";

    /// <summary>The water/HOD signal listed and counted as a compound signal.</summary>
    public const string WaterReported = "water-reported";

    /// <summary>Two or more signals match the groups of one common laboratory impurity.</summary>
    public const string ImpuritySignals = "impurity-signals";

    /// <summary>The spectrum states no solvent, so residual lines cannot be checked.</summary>
    public const string SolventMissing = "solvent-missing";

    /// <summary>The stated solvent has no tabulated residual lines.</summary>
    public const string SolventNotTabulated = "solvent-not-tabulated";
}
