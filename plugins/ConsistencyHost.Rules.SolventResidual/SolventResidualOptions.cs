using ConsistencyHost.Sdk.Options;

namespace ConsistencyHost.Rules.SolventResidual;

/// <summary>Options of the solvent-residual rule.</summary>
public sealed record SolventResidualOptions : RuleOptions
{
    /// <summary>
    /// Report impurity matches. Default true; impurity findings are info by default — a profile can raise
    /// them (e.g. to warning for a "publication" profile).
    /// </summary>
    public bool ReportImpurities { get; init; } = true;

    /// <summary>Report spectra whose solvent is missing or not in the tables (info). Default true.</summary>
    public bool ReportUncheckableSolvent { get; init; } = true;
}
