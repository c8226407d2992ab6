namespace ConsistencyHost.Spectra.Tests.Nmredata;

/// <summary>
/// NMReDATA records written for these tests following Pupier et al., Magn. Reson. Chem. 2018, 56, 703 and the
/// format's tag description (version 1.1: backslash line ends, ';' comments, H&lt;n&gt; implicit-H atoms, quoted labels).
/// MOL block: RDKit 2D coordinates of CC(=O)c1ccc(F)cc1 (atoms 1 CH3, 2 C=O, 3 O, 4 C1, 5 C2, 6 C3, 7 C4, 8 F, 9 C5, 10 C6).
/// Shifts and couplings of 4'-fluoroacetophenone in CDCl3: from memory of published spectra, illustrative for the format.
/// </summary>
internal static class NmredataFixtures
{
    public const string MolBlock = """
        4'-fluoroacetophenone
             RDKit          2D

         10 10  0  0  0  0  0  0  0  0999 V2000
            3.0000   -1.2990    0.0000 C   0  0  0  0  0  0  0  0  0  0  0  0
            2.2500    0.0000    0.0000 C   0  0  0  0  0  0  0  0  0  0  0  0
            3.0000    1.2990    0.0000 O   0  0  0  0  0  0  0  0  0  0  0  0
            0.7500   -0.0000    0.0000 C   0  0  0  0  0  0  0  0  0  0  0  0
           -0.0000   -1.2990    0.0000 C   0  0  0  0  0  0  0  0  0  0  0  0
           -1.5000   -1.2990    0.0000 C   0  0  0  0  0  0  0  0  0  0  0  0
           -2.2500    0.0000    0.0000 C   0  0  0  0  0  0  0  0  0  0  0  0
           -3.7500    0.0000    0.0000 F   0  0  0  0  0  0  0  0  0  0  0  0
           -1.5000    1.2990    0.0000 C   0  0  0  0  0  0  0  0  0  0  0  0
            0.0000    1.2990    0.0000 C   0  0  0  0  0  0  0  0  0  0  0  0
          1  2  1  0
          2  3  2  0
          2  4  1  0
          4  5  2  0
          5  6  1  0
          6  7  2  0
          7  8  1  0
          7  9  1  0
          9 10  2  0
         10  4  1  0
        M  END
        """;

    /// <summary>Version 1.1 record; the H2 signal line is split over two physical lines (only the second ends in '\').</summary>
    public const string Version11Tags = """

        >  <NMREDATA_VERSION>
        1.1\

        >  <NMREDATA_LEVEL>
        0\

        >  <NMREDATA_FORMULA>
        C8H7FO\

        >  <NMREDATA_SMILES>
        CC(=O)c1ccc(F)cc1\

        >  <NMREDATA_SOLVENT>
        CDCl3\

        >  <NMREDATA_TEMPERATURE>
        298.0 K\

        >  <NMREDATA_ASSIGNMENT>
        Me, 26.5000, 1 ;acetyl CH3 carbon\
        CO, 196.4000, 2\
        C1, 133.6000, 4\
        C2, 130.9000, 5, 10\
        C3, 115.6000, 6, 9\
        C4, 165.8000, 7\
        F, -105.4000, 8\
        HMe, 2.5800, H1 ;implicit H on atom 1\
        H2, 7.9800, H5, H10\
        <"H3,H5">, 7.1300, H6, H9\

        >  <NMREDATA_J>
        H2, <"H3,H5">, 8.80, nb=3\
        <"H3,H5">, F, 8.60, nb=3 ;3JHF\
        H2, F, 5.40, nb=4\
        C4, F, 254.60, nb=1\

        >  <NMREDATA_1D_1H>
        Larmor=400.13\
        Spectrum_Location=file:./nmr/10/pdata/1\
        7.9800, S=dd, J=8.80(<"H3,H5">),
         5.40(F), N=2, L=H2, E=2.01\
        7.1300, S=t, J=8.70, N=2, L=<"H3,H5">, E=1.98\
        2.5800, S=s, N=3, L=HMe, E=3.00, W=0.9\

        >  <NMREDATA_1D_13C>
        Larmor=100.62\
        Decoupled=1H\
        Spectrum_Location=file:./nmr/11/pdata/1\
        196.4000, N=0, L=CO\
        165.8000, S=d, J=254.60(F), N=0, L=C4\
        133.6000, S=d, J=3.00, N=0, L=C1\
        130.9000, S=d, J=9.30, N=1, L=C2\
        115.6000, S=d, J=21.90, N=1, L=C3\
        26.5000, N=3, L=Me\

        >  <NMREDATA_1D_19F>
        Larmor=376.46\
        Spectrum_Location=file:./nmr/12/pdata/1\
        -105.4000, S=m, N=1, L=F\

        $$$$
        """;

    /// <summary>Version 1.0 record without backslashes, bare temperature (as in 0.93 files), a range written high-low.</summary>
    public const string Version10Tags = """

        >  <NMREDATA_VERSION>
        1.0

        >  <NMREDATA_SOLVENT>
        chloroform-d

        >  <NMREDATA_TEMPERATURE>
        298.15

        >  <NMREDATA_ASSIGNMENT>
        H2, 7.9800, H5, H10
        H3, 7.1300, H6, H9

        >  <NMREDATA_1D_1H>
        Larmor=500.13
        Spectrum_Location=file:./nmr/20/pdata/1
        8.0000-7.9600, S=m, N=2, L=H2
        7.1300, S=m, N=2, L=H3

        $$$$
        """;

    public static string Version11Record => MolBlock + Version11Tags;

    public static string TwoRecords => MolBlock + Version11Tags + "\n" + MolBlock + Version10Tags;
}
