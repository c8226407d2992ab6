using ConsistencyHost.Spectra.Analysis.Prediction.Carbon.Core;

namespace ConsistencyHost.Spectra.Analysis.Prediction.Carbon.Aliphatic;

/// <summary>
/// sp3 carbons bearing two or more heteroatoms, where increments stop adding up (CH2Cl2 would sum to 59.7 against
/// 53.5): acetals, ketals, ortho esters, aminals, N,O- and S,S-acetals and polyhalomethanes, tabulated.
/// </summary>
/// <remarks>
/// From memory (Pretsch et al. 2009; Kalinowski et al. 1988): benzodioxole OCH2O 101.3, MOM 96.2, 1,3-dioxolane C2
/// 95.0, acyloxymethyl ethers 79–82; aldehyde acetals: 1,3-dioxolanes 103–105, 1,3-dioxanes 100–102, THP and
/// pyranoside anomeric carbons 97–105, furanosides 103–109, acyclic dialkyl acetals 101–105; ketals: acetonides and
/// dioxolane ketals 108–111, 2,2-dimethyl-1,3-dioxanes 98–101, acyclic 99–103; ortho esters 112–117;
/// N,O-acetals 75–95 (nucleoside C1′ 84–92, 2,2-dimethyloxazolidines 93–95); aminals 65–80; 1,3-dithianes C2
/// 31.9 (CH2) and 47–52 (CH). Halomethanes: CH2Cl2 53.5, CHCl3 77.4 (Gottlieb 1997: 53.52, 77.36), CCl4 96.1,
/// CH2Br2 21.6, CHBr3 12.3, CH2I2 −54.0; RCHCl2 64–72, CCl3 on sp2 carbon 90–93, on sp3 carbon 95–100.
/// </remarks>
internal static class PolyheteroCarbons
{
    /// <summary>The tabulated window, or none when the combination is not in the table.</summary>
    public static Tabulated Lookup(PredictionContext context, int carbon, HeteroCount count)
    {
        var hydrogens = context.Molecule.Atoms[carbon].HydrogenCount;
        if (count.HeavyHalogens == count.Total)
        {
            return Halomethane(context, count, hydrogens);
        }

        if (count.O == count.Total)
        {
            return count.O switch
            {
                2 => AcetalCarbons.Lookup(context, carbon, hydrogens),
                3 => hydrogens > 0 ? new(112.5, 3.0, "HC(OR)3") : new(116.0, 6.0, "RC(OR)3"),
                _ => new(119.0, 6.0, "C(OR)4"),
            };
        }

        if (count.O >= 1 && count.N >= 1 && count.O + count.N == count.Total)
        {
            return hydrogens switch { >= 2 => new(78.0, 9.0, "N–CH2–O"), 1 => new(85.0, 12.0, "N–CH–O"), _ => new(94.0, 7.0, "N–C–O") };
        }

        if (count.N == count.Total)
        {
            return hydrogens switch { >= 2 => new(66.0, 16.0, "N–CH2–N"), 1 => new(72.0, 14.0, "N–CH–N"), _ => new(78.0, 12.0, "N–C–N") };
        }

        if (count.S == count.Total)
        {
            return hydrogens switch { >= 2 => new(36.0, 8.0, "S–CH2–S"), 1 => new(52.0, 8.0, "S–CH–S"), _ => new(60.0, 12.0, "S–C–S") };
        }

        if (count.S >= 1 && count.O >= 1 && count.S + count.O == count.Total)
        {
            return new(82.0, 12.0, "O–C–S");
        }

        return count.HeavyHalogens >= 1 && count.O >= 1 ? new(88.0, 14.0, "X–C–O") : default;
    }

    private static Tabulated Halomethane(PredictionContext context, HeteroCount count, int hydrogens)
    {
        if (count.Total == count.Cl && count.FirstCarbon < 0)
        {
            return count.Cl switch { 2 => new(54.0, 2.5, "CH2Cl2"), 3 => new(78.0, 2.5, "CHCl3"), _ => new(96.1, 2.5, "CCl4") };
        }

        if (count.Total == count.Br && count.FirstCarbon < 0)
        {
            return count.Br switch { 2 => new(21.6, 3.0, "CH2Br2"), 3 => new(12.3, 3.0, "CHBr3"), _ => new(-28.5, 4.0, "CBr4") };
        }

        if (count.Cl == count.Total && count.FirstCarbon >= 0)
        {
            if (count.Cl == 2)
            {
                return new(69.0, 6.0, "R–CHCl2");
            }

            return Topology.IsSp3Carbon(context, count.FirstCarbon) ? new(97.0, 5.0, "R–CCl3") : new(91.5, 4.0, "CCl3 on sp2 carbon");
        }

        return hydrogens > 0 && count.I > 0 ? new(-40.0, 30.0, "polyiodo carbon") : new(40.0, 30.0, "polyhalo carbon");
    }
}
