using ConsistencyHost.Chemistry.Model;

namespace ConsistencyHost.Spectra.Analysis.Prediction.Proton;

/// <summary>
/// Predicted 1H shift windows for the hydrogens on one heavy atom. This first version gives environment-type
/// windows only (the coarse layer every finer method falls back to).
/// </summary>
/// <remarks>
/// Ranges: common practice, as in the chemical-shift charts of organic spectroscopy textbooks (e.g. Pretsch,
/// Bühlmann, Badertscher, Structure Determination of Organic Compounds, 4th ed., 2009, 1H overview chart; from
/// memory). Exchangeable protons get the widest windows: their shifts depend on solvent, concentration and
/// temperature.
/// </remarks>
public static class ProtonShifts
{
    /// <summary>The window for the hydrogens attached to <paramref name="heavyAtom"/> in <paramref name="solvent"/>.</summary>
    public static ShiftPrediction Predict(PredictionContext context, int heavyAtom, string? solvent)
    {
        ArgumentNullException.ThrowIfNull(context);
        var m = context.Molecule;
        var atom = m.Atoms[heavyAtom];
        if (atom.AtomicNumber != 6) return Fallback(0.0, 16.0, 5.0, "H on a heteroatom: exchangeable, solvent dependent", ShiftBasis.Exchangeable);
        if (context.IsAromatic(heavyAtom)) return Fallback(6.0, 9.8, 7.3, "aromatic C–H", ShiftBasis.EnvironmentFallback);
        foreach (var bond in m.BondsOf(heavyAtom))
        {
            var b = m.Bonds[bond];
            var other = m.Atoms[b.Other(heavyAtom)];
            if (b.Order == 3) return Fallback(1.7, 3.5, 2.5, "alkyne C–H", ShiftBasis.EnvironmentFallback);
            if (b.Order == 2 && other.AtomicNumber is 8 or 16) return Fallback(7.8, 10.6, 9.8, "formyl C–H", ShiftBasis.EnvironmentFallback);
            if (b.Order == 2) return Fallback(4.3, 8.2, 5.8, "alkene or imine C–H", ShiftBasis.EnvironmentFallback);
        }

        return Fallback(0.0, 6.2, 1.5, "sp3 C–H", ShiftBasis.EnvironmentFallback);
    }

    private static ShiftPrediction Fallback(double low, double high, double likely, string reason, ShiftBasis basis) =>
        new(new ShiftWindow(low, high, likely), basis, [reason]);
}
