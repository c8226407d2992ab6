namespace ConsistencyHost.Spectra.Tests.Solvents;

/// <summary>Peak lists written from published impurity numbers; each fixture names its source.</summary>
internal static class ImpurityFixtures
{
    /// <summary>
    /// Source: reference notes §3.6 example, written from Gottlieb, Kotlyar, Nudelman, J. Org. Chem. 1997, 62, 7512
    /// (ethyl acetate in CDCl3: 4.12 q, 2.05 s, 1.26 t; 13C 171.36, 60.49, 21.04, 14.19 via Fulmer 2010 Table 2).
    /// Line positions computed for J = 7.13 Hz at 400.13 MHz.
    /// </summary>
    public const string EthylAcetateLinkFile = """
        ##TITLE= Ethyl acetate in CDCl3 (example compound file)
        ##JCAMP-DX= 5.01
        ##DATA TYPE= LINK
        ##BLOCKS= 2
        ##TITLE= Ethyl acetate 1H peak table
        ##JCAMP-DX= 5.01
        ##DATA TYPE= NMR PEAK TABLE
        ##DATA CLASS= PEAK TABLE
        ##BLOCK_ID= 1
        ##ORIGIN= hand-written example
        ##OWNER= public domain
        ##.OBSERVE FREQUENCY= 400.13
        ##.OBSERVE NUCLEUS= ^1H
        ##.SOLVENT NAME= CDCl3
        ##TEMPERATURE= 25        $$ degrees C
        ##XUNITS= PPM
        ##YUNITS= ARBITRARY UNITS
        ##XFACTOR= 1
        ##YFACTOR= 1
        ##NPOINTS= 8
        ##PEAK TABLE= (XY..XY)
        4.1467, 25.0
        4.1289, 75.0
        4.1111, 75.0
        4.0933, 25.0
        2.0500, 300.0
        1.2778, 75.0
        1.2600, 150.0
        1.2422, 75.0
        ##END=
        ##TITLE= Ethyl acetate 13C peak table
        ##JCAMP-DX= 5.01
        ##DATA TYPE= NMR PEAK TABLE
        ##DATA CLASS= PEAK TABLE
        ##BLOCK_ID= 2
        ##CROSS REFERENCE= same sample as BLOCK_ID= 1
        ##ORIGIN= hand-written example
        ##OWNER= public domain
        ##.OBSERVE FREQUENCY= 100.62
        ##.OBSERVE NUCLEUS= ^13C
        ##.SOLVENT NAME= CDCl3
        ##XUNITS= PPM
        ##YUNITS= ARBITRARY UNITS
        ##NPOINTS= 4
        ##PEAK TABLE= (XYM..XYM)
        171.36, 40.0, S
        60.49, 100.0, T
        21.04, 95.0, Q
        14.19, 90.0, Q
        ##END=
        ##END=
        """;

    /// <summary>
    /// Source: Gottlieb 1997 Table 1 (diethyl ether in DMSO-d6: CH3 1.09 t, CH2 3.38 q; water 3.33) at Gottlieb's
    /// 300.1 MHz, written in Hz with XFACTOR 0.001 (1.09 × 300.1 = 327.109 Hz), labels in mixed spelling.
    /// </summary>
    public const string DiethylEtherInDmsoHz = """
        ##TITLE= diethyl ether trace in DMSO-d6 $$ Gottlieb 1997 Table 1
        ##JCAMPDX= 4.24
        ##DATA_TYPE= NMR PEAK TABLE
        ##.Observe Frequency= 300.1
        ##.OBSERVENUCLEUS= ^1H
        ##.solvent_name= DMSO-d6
        ##TEMPERATURE= 297
        ##XUNITS= HZ
        ##X-FACTOR= 0.001
        ##YFACTOR= 0.5
        ##NPOINTS= 3
        ##PEAKTABLE= (XYW..XYW)
        327109, 600, 1200; 1014338, 400, 1500
        999333, 100, 3000
        ##END=
        """;

    /// <summary>Source: Fulmer 2010 Table 2 via a transcription (triethylamine in CDCl3: 11.61, 46.25) at 75.5 MHz.</summary>
    public const string TriethylamineCarbonAssignments = """
        ##TITLE= triethylamine 13C in CDCl3 $$ Fulmer 2010 Table 2
        ##JCAMP-DX= 5.01
        ##DATA TYPE= NMR PEAK ASSIGNMENTS
        ##.OBSERVE FREQUENCY= 75.5
        ##.OBSERVE NUCLEUS= ^13C
        ##.SOLVENT NAME= CDCl3
        ##XUNITS= PPM
        ##PEAK ASSIGNMENTS= (XYMA)
        (46.25, 50.0, T, <CH2>)
        (11.61, 45.0, Q, <CH3>)
        (77.16, 80.0, T, <CDCl3>)
        ##END=
        """;

    /// <summary>Source: Gottlieb 1997 Table 1, ethyl acetate and water in CDCl3, written as journal text at 300 MHz.</summary>
    public const string EthylAcetateText =
        "1H NMR (300 MHz, CDCl3) δ 7.26 (s), 4.12 (q, J = 7 Hz, 2H), 2.05 (s, 3H), 1.56 (br s), 1.26 (t, J = 7 Hz, 3H).";

    /// <summary>Source: Fulmer 2010 Table 2 via a transcription, 13C of toluene in DMSO-d6 (21.0 rounded) and the solvent line 39.52.</summary>
    public const string TolueneCarbonText =
        "13C NMR (75 MHz, DMSO-d6) δ 137.35, 128.88, 128.18, 125.29, 39.52, 20.99.";
}
