using ConsistencyHost.Spectra.Analysis.Prediction.Carbon.Core;

namespace ConsistencyHost.Spectra.Analysis.Prediction.Carbon.Carbonyl;

/// <summary>Aryl sides of carbonyl carbons turned out of plane by ortho substituents.</summary>
internal static class ArylTwist
{
    /// <summary>
    /// Ortho substituents twist an aryl side out of conjugation: 2-methylacetophenone 201.4 and mesityl ketones
    /// 205–210 against acetophenone 198.1; esters and amides move half as much (methyl 2-methylbenzoate 168.0,
    /// methyl mesitoate 170.5; from memory).
    /// </summary>
    public static void Add(PredictionContext context, int ipso, CarbonylSideTable table, CarbonEstimate estimate)
    {
        var m = context.Molecule;
        var ortho = 0;
        foreach (var o in m.Neighbours(ipso))
        {
            if (context.IsAromatic(o) && context.IsAromaticBond(ipso, o) && m.Degree(o) >= 3)
            {
                ortho++;
            }
        }

        if (ortho == 0)
        {
            return;
        }

        // Aldehydes stay planar (2-methoxybenzaldehyde 189.8, mesitaldehyde 192.9): no shift, only a wider window.
        var scale = ReferenceEquals(table, CarbonylTables.Ketone) ? 1.0 : ReferenceEquals(table, CarbonylTables.Aldehyde) ? 0.0 : 0.5;
        estimate.AddNonZero(ortho == 1 ? "ortho-substituted aryl" : "di-ortho-substituted aryl", scale * (ortho == 1 ? 2.5 : 6.0));
        estimate.Widen(ortho == 1 ? 1.5 : 2.5);
    }
}
