using ConsistencyHost.Spectra.Analysis.Prediction.Carbon.Aliphatic;
using ConsistencyHost.Spectra.Analysis.Prediction.Carbon.Aromatic;
using ConsistencyHost.Spectra.Analysis.Prediction.Carbon.Carbonyl;
using ConsistencyHost.Spectra.Analysis.Prediction.Carbon.Core;
using ConsistencyHost.Spectra.Analysis.Prediction.Carbon.Unsaturated;

namespace ConsistencyHost.Spectra.Analysis.Prediction.Carbon;

/// <summary>
/// Predicted 13C shift windows: Grant–Paul type increments for sp3 carbons (with tables for methyls on heteroatoms,
/// CF3/CF2 and acetal-type carbons), benzene increments on parent ring systems for aromatic carbons, alkene and
/// alkyne increments, and type tables for carbonyl, thiocarbonyl, imine and nitrile carbons; environment-type
/// windows for anything else.
/// </summary>
/// <remarks>
/// Each window's half-width follows the method's error: it grows with the number of substituents, with rows taken
/// from memory, with ring strain and crowding, with C–F multiplet lines, with the solvent (tables are for CDCl3)
/// and always includes the referencing spread. Each table names its source in its remarks.
/// </remarks>
public static class CarbonShifts
{
    /// <summary>The window for <paramref name="carbon"/> in <paramref name="solvent"/> (a canonical solvent name, or null).</summary>
    /// <exception cref="ArgumentOutOfRangeException">The index is not an atom of the molecule.</exception>
    /// <exception cref="ArgumentException">The atom is not a carbon.</exception>
    public static ShiftPrediction Predict(PredictionContext context, int carbon, string? solvent)
    {
        ArgumentNullException.ThrowIfNull(context);
        var m = context.Molecule;
        ArgumentOutOfRangeException.ThrowIfNegative(carbon);
        ArgumentOutOfRangeException.ThrowIfGreaterThanOrEqual(carbon, m.AtomCount);
        if (m.Atoms[carbon].AtomicNumber != Topology.Carbon)
        {
            throw new ArgumentException($"Atom {carbon} is {m.Atoms[carbon].Symbol}, not carbon; 13C windows are for carbon atoms.", nameof(carbon));
        }

        var prediction = ByEnvironment(context, carbon, solvent, out var carbonylSolventDone);
        return carbonylSolventDone ? prediction : Widening.Apply(prediction, SolventEffects.Other(solvent), SolventReason(solvent));
    }

    private static ShiftPrediction ByEnvironment(PredictionContext context, int carbon, string? solvent, out bool solventDone)
    {
        var m = context.Molecule;
        solventDone = false;
        var atom = m.Atoms[carbon];
        if (atom.Charge != 0 || atom.Radical != 0)
        {
            return CarbonFallback.Predict(context, carbon);
        }

        if (context.IsAromatic(carbon))
        {
            return AromaticCarbons.Predict(context, carbon);
        }

        if (Topology.PartnerByOrder(m, carbon, 3) is var triple and >= 0)
        {
            return m.Atoms[triple].AtomicNumber switch
            {
                Topology.Nitrogen => NitrileCarbons.Predict(context, carbon, triple),
                Topology.Carbon => AlkyneCarbons.Predict(context, carbon, triple),
                _ => CarbonFallback.Predict(context, carbon),
            };
        }

        return DoubleBonded(context, carbon, solvent, ref solventDone);
    }

    private static ShiftPrediction DoubleBonded(PredictionContext context, int carbon, string? solvent, ref bool solventDone)
    {
        var m = context.Molecule;
        int first = -1, second = -1;
        var neighbours = m.Neighbours(carbon);
        var bonds = m.BondsOf(carbon);
        for (var i = 0; i < neighbours.Length; i++)
        {
            if (m.Bonds[bonds[i]].Order != 2)
            {
                continue;
            }

            (first, second) = first < 0 ? (neighbours[i], second) : (first, neighbours[i]);
        }

        if (first < 0)
        {
            return Sp3Carbons.Predict(context, carbon);
        }

        var z = m.Atoms[first].AtomicNumber;
        if (second >= 0 && !(z == Topology.Carbon && m.Atoms[second].AtomicNumber == Topology.Carbon))
        {
            return CumulatedCarbons.Predict(z, m.Atoms[second].AtomicNumber);
        }

        solventDone = z == Topology.Oxygen;
        return z switch
        {
            Topology.Oxygen => CarbonylCarbons.Predict(context, carbon, first, solvent),
            Topology.Sulfur => ThiocarbonylCarbons.Predict(context, carbon, first),
            Topology.Nitrogen => ImineCarbons.Predict(context, carbon, first),
            Topology.Carbon => AlkeneCarbons.Predict(context, carbon, first),
            _ => CarbonFallback.Predict(context, carbon),
        };
    }

    private static string SolventReason(string? solvent) => solvent switch
    {
        null => "more: solvent not given",
        "DMSO-d6" => "more: DMSO-d6 (tables are for CDCl3)",
        "CD3OD" => "more: CD3OD (tables are for CDCl3)",
        "D2O" => "more: D2O (tables are for CDCl3)",
        _ => "more: solvent other than CDCl3",
    };
}
