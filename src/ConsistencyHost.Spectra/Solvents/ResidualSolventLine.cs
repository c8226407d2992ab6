using ConsistencyHost.Spectra.Model;

namespace ConsistencyHost.Spectra.Solvents;

/// <summary>Kind of a solvent-related line.</summary>
public enum SolventLineKind
{
    /// <summary>Residual protio-solvent (1H) or the solvent's own carbon (13C).</summary>
    Residual,
    /// <summary>Water (H2O/HOD) dissolved in the solvent.</summary>
    Water,
}

/// <summary>One residual-solvent or water line of a deuterated solvent.</summary>
/// <param name="Solvent">Canonical solvent name (<see cref="SolventNames"/>).</param>
/// <param name="Nucleus">1H or 13C.</param>
/// <param name="Kind">Residual line or water.</param>
/// <param name="ShiftPpm">Tabulated shift.</param>
/// <param name="Multiplicity">Multiplicity from coupling to deuterium ("quint", "sept", "t", "s").</param>
/// <param name="Species">What gives the line ("CHD2S(O)CD3", "HOD").</param>
/// <param name="Source">Where the shift comes from.</param>
public sealed record ResidualSolventLine(
    string Solvent, Nucleus Nucleus, SolventLineKind Kind, double ShiftPpm, string Multiplicity, string Species, DataSource Source);
