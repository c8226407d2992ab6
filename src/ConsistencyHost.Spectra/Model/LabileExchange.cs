namespace ConsistencyHost.Spectra.Model;

/// <summary>Solvents in which O–H, N–H and S–H protons exchange with deuterium and vanish from 1H spectra.</summary>
public static class LabileExchange
{
    /// <summary>True for D2O and CD3OD (common practice: labile protons are replaced by D).</summary>
    public static bool RemovesExchangeableProtons(string? solvent) =>
        SolventNames.Normalise(solvent) is "D2O" or "CD3OD";
}
