namespace ConsistencyHost.Chemistry.Tests.Perception.Symmetry;

/// <summary>Textbook topicity cases: expected numbers of 1H and 13C classes in an achiral solvent (fast exchange).</summary>
/// <remarks>Each row names its source. "Common practice" marks facts every NMR text states; configurations were
/// checked with RDKit's CIP labeller (Chem.FindMolChiralCenters) where the row names one.</remarks>
internal static class TopicityCases
{
    public static TheoryData<string, string, int, int, string> Rows => new()
    {
        // name, SMILES, H classes, C classes, what is hard
        { "ethylbenzene", "CCc1ccccc1", 5, 6, "CH2 enantiotopic: one class. Source: Silverstein, Webster, Kiemle, Spectrometric Identification of Organic Compounds (from memory)" },
        { "2-butanol", "CC(O)CC", 6, 4, "C3-H2 diastereotopic next to a stereocentre. Source: nmr-methods.md §2.2 (computed test list)" },
        { "styrene", "C=Cc1ccccc1", 6, 6, "=CH2 protons cis/trans to phenyl: two classes. Common practice" },
        { "propene", "C=CC", 4, 3, "=CH2 diastereotopic. Source: nmr-methods.md §2.2" },
        { "L-valine", "CC(C)[C@H](N)C(=O)O", 6, 5, "isopropyl methyls diastereotopic (two 13C and two 1H doublets). Common practice" },
        { "valine, unspecified", "CC(C)C(N)C(=O)O", 6, 5, "one unspecified centre still makes the methyls diastereotopic. Source: nmr-methods.md §2.4" },
        { "isobutylbenzene", "CC(C)Cc1ccccc1", 6, 7, "no stereocentre: CH2 enantiotopic, methyls enantiotopic. Common practice" },
        { "citric acid", "OC(=O)CC(O)(CC(=O)O)C(=O)O", 5, 4, "prochiral C3: the two CH2 groups are enantiotopic, the two H within each CH2 diastereotopic (AB pattern). Common practice" },
        { "glycerol", "OCC(O)CO", 5, 2, "prochiral C2: CH2 protons diastereotopic (ABX). Source: nmr-methods.md §2.8 test list; common practice" },
        { "meso-2,4-pentanediol", "C[C@H](O)C[C@H](O)C", 5, 3, "meso (2R,4S): C3-H2 diastereotopic. Source: nmr-methods.md §2.2 (computed); RDKit CIP (S,R)" },
        { "(S,S)-2,4-pentanediol", "C[C@H](O)C[C@@H](O)C", 4, 3, "C2-symmetric: C3-H2 homotopic. Source: nmr-methods.md §2.2; RDKit CIP (S,S)" },
        { "cis-1,2-dimethylcyclopropane", "C[C@H]1C[C@H]1C", 4, 3, "meso: ring CH2 faces differ (H cis vs trans to the methyls). Common practice; RDKit CIP (1S,2R)" },
        { "trans-1,2-dimethylcyclopropane", "C[C@H]1C[C@@H]1C", 3, 3, "C2 axis exchanges the ring CH2 protons. Common practice; RDKit CIP (1S,2S)" },
        { "cyclohexane", "C1CCCCC1", 1, 1, "fast ring flip: one signal. Source: nmr-methods.md §2.6" },
        { "methylcyclohexane", "CC1CCCCC1", 8, 5, "ring CH2 protons cis/trans to the methyl. Source: nmr-methods.md §2.6" },
        { "1,4-dimethylcyclohexane", "CC1CCC(C)CC1", 4, 3, "ring CH2 protons cis/trans to the methyls in both isomers. Common practice" },
        { "dichloromethane", "ClCCl", 1, 1, "homotopic. Source: nmr-methods.md §2.2" },
        { "ethyl acetate", "CCOC(C)=O", 3, 4, "OCH2 enantiotopic (quartet). Source: Gottlieb, Kotlyar, Nudelman, J. Org. Chem. 1997, 62, 7512 (q, t, s)" },
        { "1-chloro-4-nitrobenzene", "Clc1ccc(cc1)[N+](=O)[O-]", 2, 4, "AA'XX': two chemically equivalent pairs. Source: nmr-methods.md §2.5" },
        { "toluene (Kekulé input)", "CC1=CC=CC=C1", 4, 5, "Kekulé form must give aromatic symmetry. Source: Gottlieb 1997 toluene rows (CH3, o/m/p)" },
        { "isobutylene", "C=C(C)C", 2, 3, "=CH2 protons exchanged by the symmetry swapping the methyls. Common practice" },
        { "2-methyl-2-butene", "CC=C(C)C", 4, 5, "gem-dimethyl cis and trans to the CH3: two methyl signals. Common practice" },
        { "(E)-2-butene", "C/C=C/C", 2, 2, "C2h. Common practice" },
        { "3-pentanol", "CCC(O)CC", 5, 3, "prochiral C3: ethyl groups enantiotopic, CH2 protons diastereotopic. Common practice" },
        { "diethyl ether", "CCOCC", 2, 2, "CH2 enantiotopic (quartet). Source: Gottlieb 1997 diethyl ether rows (q, t)" },
        { "benzyl alcohol", "OCc1ccccc1", 5, 5, "CH2 enantiotopic. Common practice" },
        { "1-phenylethanol", "C[C@@H](O)c1ccccc1", 6, 6, "ring flip keeps ortho/meta pairs equivalent next to a stereocentre. Common practice" },
        { "1-bromo-2-chloroethane", "ClCCBr", 2, 2, "each CH2 enantiotopic. Common practice" },
        { "L-phenylalanine", "N[C@@H](Cc1ccccc1)C(=O)O", 8, 7, "benzylic CH2 diastereotopic (ABX). Common practice" },
        { "cuneane", "C12C3C4C3C2C5C4C15", 3, 3, "3-regular cage, pentacyclo[3.3.0.0^2,4.0^3,7.0^6,8]octane: refinement alone gives 1 class, orbits are 3 (2:4:2). Source: nmr-methods.md §1.4" },
        { "cubane", "C12C3C4C1C5C2C3C45", 1, 1, "one orbit. Source: nmr-methods.md §1.9" },
    };
}
