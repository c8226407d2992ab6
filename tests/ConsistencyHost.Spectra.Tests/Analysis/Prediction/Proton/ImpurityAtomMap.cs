namespace ConsistencyHost.Spectra.Tests.Analysis.Prediction.Proton;

/// <summary>
/// Which atoms of each impurity's SMILES (as written in <c>ImpurityTable</c>) carry the hydrogens of each tabulated
/// group, mapped by hand from the group labels of Gottlieb 1997 / Fulmer 2010. Greases have no single structure:
/// hydrocarbon grease is represented by n-icosane (long-chain alkane) and silicone grease by the inner Si(CH3)2 of
/// octamethyltrisiloxane (a polydimethylsiloxane segment); water (a line of the residual-solvent table) by H2O.
/// </summary>
internal static class ImpurityAtomMap
{
    /// <summary>Impurity name → (SMILES used, group label → atoms).</summary>
    public static readonly Dictionary<string, (string? Smiles, Dictionary<string, int[]> Groups)> Map = new()
    {
        ["acetic acid"] = (null, new() { ["CH3"] = [0], ["COOH"] = [3] }),
        ["acetone"] = (null, new() { ["CH3"] = [0, 2] }),
        ["acetonitrile"] = (null, new() { ["CH3"] = [0] }),
        ["benzene"] = (null, new() { ["CH"] = [0, 1, 2, 3, 4, 5] }),
        ["tert-butyl methyl ether"] = (null, new() { ["C(CH3)3"] = [3, 4, 5], ["OCH3"] = [0] }),
        ["chloroform"] = (null, new() { ["CH"] = [1] }),
        ["dichloromethane"] = (null, new() { ["CH2"] = [1] }),
        ["diethyl ether"] = (null, new() { ["CH3"] = [0, 4], ["CH2"] = [1, 3] }),
        ["DMF"] = (null, new() { ["CHO"] = [3], ["NCH3"] = [0], ["NCH3'"] = [2] }),
        ["DMSO"] = (null, new() { ["CH3"] = [0, 2] }),
        ["1,4-dioxane"] = (null, new() { ["CH2"] = [0, 1, 3, 4] }),
        ["ethanol"] = (null, new() { ["CH3"] = [0], ["CH2"] = [1], ["OH"] = [2] }),
        ["ethyl acetate"] = (null, new() { ["CH3C(O)"] = [4], ["OCH2"] = [1], ["CH3"] = [0] }),
        ["n-hexane"] = (null, new() { ["CH3"] = [0, 5], ["CH2"] = [1, 2, 3, 4] }),
        ["methanol"] = (null, new() { ["CH3"] = [0], ["OH"] = [1] }),
        ["n-pentane"] = (null, new() { ["CH3"] = [0, 4], ["CH2"] = [1, 2, 3] }),
        ["2-propanol"] = (null, new() { ["CH3"] = [0, 2], ["CH"] = [1], ["OH"] = [3] }),
        ["pyridine"] = (null, new() { ["H-2/6"] = [2, 4], ["H-3/5"] = [1, 5], ["H-4"] = [0] }),
        ["tetrahydrofuran"] = (null, new() { ["OCH2"] = [2, 4], ["CH2"] = [0, 1] }),
        ["toluene"] = (null, new() { ["CH3"] = [0], ["H-2/4/6"] = [2, 4, 6], ["H-3/5"] = [3, 5] }),
        ["triethylamine"] = (null, new() { ["CH3"] = [0, 4, 6], ["CH2"] = [1, 3, 5] }),
        ["grease"] = ("CCCCCCCCCCCCCCCCCCCC", new() { ["CH3"] = [0], ["CH2"] = [1, 5, 9] }),
        ["silicone grease"] = ("C[Si](C)(C)O[Si](C)(C)O[Si](C)(C)C", new() { ["SiCH3"] = [6, 7] }),
    };
}
