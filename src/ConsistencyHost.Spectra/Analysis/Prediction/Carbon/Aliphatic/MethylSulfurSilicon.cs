using ConsistencyHost.Spectra.Analysis.Prediction.Carbon.Core;

namespace ConsistencyHost.Spectra.Analysis.Prediction.Carbon.Aliphatic;

/// <summary>Methyls on sulfone sulfur and on silicon (sources in <see cref="MethylHetero"/>).</summary>
internal static class MethylSulfurSilicon
{
    /// <summary>Methyl sulfones by the sulfur's other substituent.</summary>
    public static Tabulated Sulfone(PredictionContext context, int methyl, int sulfur)
    {
        var m = context.Molecule;
        foreach (var x in m.Neighbours(sulfur))
        {
            if (x == methyl || m.Atoms[x].AtomicNumber == Topology.Oxygen && m.Bonds[m.BondBetween(sulfur, x)].Order == 2)
            {
                continue;
            }

            return m.Atoms[x].AtomicNumber switch
            {
                Topology.Oxygen => new(37.8, 2.5, "CH3–SO2–O"),
                Topology.Nitrogen => new(40.0, 2.5, "CH3–SO2–N"),
                _ when context.IsAromatic(x) => new(44.5, 2.0, "CH3–SO2–aryl"),
                _ => new(41.0, 3.0, "CH3–SO2–R"),
            };
        }

        return new(42.0, 4.0, "CH3–SO2");
    }

    /// <summary>Si–CH3: TBS/TBDPS-type silicon bearing a tertiary carbon sits near −5; others near 0.</summary>
    public static Tabulated Silicon(PredictionContext context, int silicon)
    {
        var m = context.Molecule;
        foreach (var x in m.Neighbours(silicon))
        {
            if (Topology.IsSp3Carbon(context, x) && m.Degree(x) >= 4)
            {
                return new(-4.5, 2.3, "CH3–Si(tert-alkyl)");
            }
        }

        return new(-0.3, 2.5, "CH3–Si");
    }
}
