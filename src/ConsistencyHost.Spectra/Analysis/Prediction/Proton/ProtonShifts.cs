using ConsistencyHost.Spectra.Analysis.Prediction.Proton.Aliphatic;
using ConsistencyHost.Spectra.Analysis.Prediction.Proton.Aromatic;
using ConsistencyHost.Spectra.Analysis.Prediction.Proton.Exchangeable;
using ConsistencyHost.Spectra.Analysis.Prediction.Proton.Olefinic;
using ConsistencyHost.Spectra.Analysis.Prediction.Proton.Special;

namespace ConsistencyHost.Spectra.Analysis.Prediction.Proton;

/// <summary>
/// Predicted 1H shift windows for the hydrogens attached to one heavy atom, by published increment methods:
/// Beauchamp–Marquez α/β/γ additivity for sp3 C–H (with tabulated CH3–X, CHX3/CH2X2, acetal and ring cases),
/// benzene ortho/meta/para increments and heteroaromatic parent positions for aromatic C–H, Pascual–Meier–Simon
/// increments for vinyl C–H, tables for CHO, CH=N and ≡C–H, and solvent-dependent class ranges for O–H, N–H, S–H.
/// Anything else gets a wide environment window.
/// </summary>
/// <remarks>Each table names its source in its own file under this folder (Aliphatic/, Aromatic/, Olefinic/,
/// Special/, Exchangeable/). Known limits: no through-space anisotropy beyond the allowances stated (peri groups,
/// N-acyl azoles, nearby aromatic rings); charged and organometallic systems get environment windows only.</remarks>
public static class ProtonShifts
{
    /// <summary>The window for the hydrogens attached to <paramref name="heavyAtom"/> in <paramref name="solvent"/>
    /// (a canonical name from <see cref="Model.SolventNames"/>, or null when not given).</summary>
    public static ShiftPrediction Predict(PredictionContext context, int heavyAtom, string? solvent)
    {
        ArgumentNullException.ThrowIfNull(context);
        var atom = context.Molecule.Atoms[heavyAtom];
        return atom.AtomicNumber switch
        {
            6 => OnCarbon(context, heavyAtom, solvent),
            7 or 8 or 16 or 34 => ExchangeableShifts.Predict(context, heavyAtom, solvent),
            _ => EnvironmentWindows.OnOtherElement(atom.AtomicNumber),
        };
    }

    private static ShiftPrediction OnCarbon(PredictionContext context, int carbon, string? solvent)
    {
        if (context.IsAromatic(carbon))
        {
            return AromaticShifts.Predict(context, carbon, solvent);
        }

        var m = context.Molecule;
        if (m.Atoms[carbon].Charge != 0 || m.Atoms[carbon].Radical != 0)
        {
            return EnvironmentWindows.UnclassifiedCarbon("charged or radical carbon");
        }

        var bonds = m.BondsOf(carbon);
        var neighbours = m.Neighbours(carbon);
        for (var k = 0; k < bonds.Length; k++)
        {
            var order = m.Bonds[bonds[k]].Order;
            if (order == 1)
            {
                continue;
            }

            return MultipleBond(context, carbon, neighbours[k], order, solvent);
        }

        return AliphaticShifts.Predict(context, carbon, solvent);
    }

    private static ShiftPrediction MultipleBond(PredictionContext context, int carbon, int partner, int order, string? solvent)
    {
        var element = context.Molecule.Atoms[partner].AtomicNumber;
        return (order, element) switch
        {
            (3, 6) => AlkyneShifts.Predict(context, carbon, partner, solvent),
            (2, 8 or 16) => FormylShifts.Predict(context, carbon, partner, imine: false, solvent),
            (2, 7) => FormylShifts.Predict(context, carbon, partner, imine: true, solvent),
            (2, 6) when IsCumulated(context, partner, carbon) => EnvironmentWindows.Allene(),
            (2, 6) => AlkeneShifts.Predict(context, carbon, partner, solvent),
            _ => EnvironmentWindows.UnclassifiedCarbon("C–H on an unusual multiple bond"),
        };
    }

    private static bool IsCumulated(PredictionContext context, int atom, int except)
    {
        var m = context.Molecule;
        var bonds = m.BondsOf(atom);
        var neighbours = m.Neighbours(atom);
        for (var k = 0; k < bonds.Length; k++)
        {
            if (neighbours[k] != except && m.Bonds[bonds[k]].Order == 2)
            {
                return true;
            }
        }

        return false;
    }
}
