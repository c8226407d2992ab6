using ConsistencyHost.Spectra.Reported;

namespace ConsistencyHost.Spectra.Tests.Reported;

/// <summary>
/// Real-world spellings (issue 13): each row names where the spelling comes from, the text, and how it is read
/// (see SpectrumDescription; "!" marks a note). Rows citing "si-NNN" quote that row of the published corpus
/// (tests/ConsistencyHost.Rules.Tests/Fixtures/published-si-entries.tsv, shortened to the part shown); the others
/// are common practice with shift values invented for the form.
/// </summary>
public sealed class ReportedTextReaderVariantTableTests
{
    private const string Common = "Common practice";

    public static TheoryData<string, string, string> Rows => new()
    {
        // Headers: δ lost in the PDF text layer, the scale inside the header, notes inside the header.
        { "si-001", "dH (CDCl3, 300 MHz) 2.34 (t, J 12.0, 2H, CH2), 0.93 (t, J 12.0, 3H, CH3). dC (CDCl3, 75 MHz) 119.7, 13.5.",
            "1H 300 CDCl3 | 2.34 t J12 n2 @CH2 ; 0.93 t J12 n3 @CH3 || 13C 75 CDCl3 | 119.7 ; 13.5" },
        { "si-039", "dH (400 MHz, CDCl3) 7.33–7.18 (m, 5H)", "1H 400 CDCl3 | 7.18-7.33 m n5" },
        { Common, "dH (400 MHz, DMSO-d6) 10.02 (br s, 1H)", "1H 400 DMSO-d6 | 10.02 br s n1" },
        { Common, "δH (CDCl3, 300 MHz) 7.26 (s, 1H); δC (CDCl3, 75 MHz) 128.4", "1H 300 CDCl3 | 7.26 s n1 || 13C 75 CDCl3 | 128.4" },
        { Common, "13C{1H} NMR (101 MHz, CDCl3) δ 170.1", "13C{1H} 101 CDCl3 | 170.1" },
        { Common, "1H NMR (400 MHz, CDCl3, rotamers 6:4) δ 3.41 (s, 3H)", "1H 400 CDCl3 !rotamers 6:4 | 3.41 s n3" },
        { "si-137", "1H NMR (400 MHz, CDCl3, major Z isomer) δ 7.00 (d, J = 12.5 Hz, 1H)", "1H 400 CDCl3 !major Z isomer | 7 d J12.5 n1" },
        { "si-207", "1H NMR (300 MHz, CDCl3, cis-trans mixture) δ: 4.17-4.08 (m, 2H)", "1H 300 CDCl3 !cis-trans mixture | 4.08-4.17 m n2" },
        { "si-044", "1H NMR (400 MHz, CDCl3/TMS) δ (ppm): 1.92–1.98 (m, 2H)", "1H 400 CDCl3 | 1.92-1.98 m n2" },
        { "si-154", "1H NMR (CDCl3, 300 MHz, ppm): d = 7.41–7.23 (m, 5H)", "1H 300 CDCl3 | 7.23-7.41 m n5" },
        { "si-162", "1H NMR (CDCl3, 300 MHz, δ, ppm): 0.93 (t, J = 7.5 Hz, 3H, Me)", "1H 300 CDCl3 | 0.93 t J7.5 n3 @Me" },
        // Multiplicities: partly resolved, pseudo, spaced and "of" forms, broad without a blank, typographic primes.
        { Common, "1H NMR (400 MHz, CDCl3) δ 5.62 (dm, J = 10.1 Hz, 1H), 2.05 (tm, J = 7.0 Hz, 2H), 2.31 (qm, J = 7.2 Hz, 2H), 4.90 (br dm, J = 17.0 Hz, 1H)",
            "1H 400 CDCl3 | 5.62 dm J10.1 n1 ; 2.05 tm J7 n2 ; 2.31 qm J7.2 n2 ; 4.9 br dm J17 n1" },
        { Common, "1H NMR (400 MHz, CDCl3) δ 7.20 (pt, J = 7.8 Hz, 1H), 7.21 (ps t, J = 7.8 Hz, 1H), 7.22 (pseudo-t, J = 7.8 Hz, 1H)",
            "1H 400 CDCl3 | 7.2 app t J7.8 n1 ; 7.21 app t J7.8 n1 ; 7.22 app t J7.8 n1" },
        { Common, "1H NMR (400 MHz, CDCl3) δ 2.90 (sept d, J = 6.9, 1.2 Hz, 1H), 2.91 (sept of d, J = 6.9, 1.2 Hz, 1H), 7.05 (d of d, J = 8.0, 2.0 Hz, 1H), 7.06 (doublet of doublets, J = 8.0, 2.0 Hz, 1H)",
            "1H 400 CDCl3 | 2.9 septd J6.9,1.2 n1 ; 2.91 septd J6.9,1.2 n1 ; 7.05 dd J8,2 n1 ; 7.06 dd J8,2 n1" },
        { "si-027, si-095", "1H NMR (400 MHz, CDCl3) δ 7.74 (bd, J = 7.9 Hz, 1H), 4.02 (brd, J = 12.8 Hz, 1H)", "1H 400 CDCl3 | 7.74 br d J7.9 n1 ; 4.02 br d J12.8 n1" },
        { "si-070", "1H NMR (400 MHz, CDCl3) δ 7.28 (AA’BB’, 4H)", "1H 400 CDCl3 | 7.28 AA’BB’ n4" },
        // Notes after the list, in brackets, and rotamer notation.
        { Common, "1H NMR (400 MHz, CDCl3) δ 4.12 (q, J = 7.1 Hz, 2H), 1.25 (t, J = 7.1 Hz, 3H); rotamers observed.",
            "1H 400 CDCl3 !rotamers observed | 4.12 q J7.1 n2 ; 1.25 t J7.1 n3" },
        { Common, "1H NMR (400 MHz, CDCl3) δ 7.31–7.24 (m, 5H), 4.65 (s, 2H); OH not observed. 13C NMR (101 MHz, CDCl3) δ 65.2",
            "1H 400 CDCl3 !OH not observed | 7.24-7.31 m n5 ; 4.65 s n2 || 13C 101 CDCl3 | 65.2" },
        { "si-207", "1H NMR (300 MHz, CDCl3) δ: 1.27-1.22 (m, 3H) ppm. (Hydroxyl signal was not observed.)",
            "1H 300 CDCl3 !Hydroxyl signal was not observed | 1.22-1.27 m n3" },
        { Common, "1H NMR (400 MHz, CDCl3) δ 4.05 (s, 3H) [minor rotamer: 4.02 (s)], 2.10 (s, 3H)",
            "1H 400 CDCl3 | 4.05 s n3 !minor rotamer: 4.02 (s) ; 2.1 s n3" },
        { Common, "1H NMR (400 MHz, CDCl3) δ 4.05 (s, 3H), [minor rotamer: 4.02 (s)], 2.10 (s, 3H)",
            "1H 400 CDCl3 | 4.05 s n3 !minor rotamer: 4.02 (s) ; 2.1 s n3" },
        { "si-041", "1H NMR (400 MHz, CDCl3) δ 8.24/8.10 (s, 1 H), 7.13/7.03 (d, J = 8.8 Hz, 1 H), 6.46−6.43 (m, 2 H)",
            "1H 400 CDCl3 | 8.24 s n1 !rotamers 8.24/8.10 ; 7.13 d J8.8 n1 !rotamers 7.13/7.03 ; 6.43-6.46 m n2" },
        { Common, "1H NMR (400 MHz, CDCl3) δ 7.05 (2 × dd, J = 8.0, 2.0 Hz, 1H), 4.33 (d, J = 7.0 Hz, 1H, rotamer A), 4.22 (d, J = 7.0 Hz, 1H, rotamer B)",
            "1H 400 CDCl3 | 7.05 dd J8,2 n1 !2 × dd ; 4.33 d J7 n1 !rotamer A ; 4.22 d J7 n1 !rotamer B" },
        // List joints: "and" before the last signal, a header glued to the closing '.', "Hz and", '¼' for '='.
        { "si-162", "1H NMR (CDCl3, 300 MHz) δ 7.33 (s, 3H, ArH), and 7.35 (s, 2H, ArH).", "1H 300 CDCl3 | 7.33 s n3 @ArH ; 7.35 s n2 @ArH" },
        { "si-026", "1H NMR (300 MHz, CDCl3) δ 7.26 (s, 1H).13C NMR (75 MHz, CDCl3) δ 152.0", "1H 300 CDCl3 | 7.26 s n1 || 13C 75 CDCl3 | 152" },
        { "si-086", "1H NMR (400 MHz, CDCl3) δ 7.90 (dd, J = 8.0 Hz and 1.2 Hz, 1H, Ar)", "1H 400 CDCl3 | 7.9 dd J8,1.2 n1 @Ar" },
        { "si-003", "1H NMR (400 MHz, CDCl3) d 8.35 (d, J¼8.3 Hz, 2H)", "1H 400 CDCl3 | 8.35 d J8.3 n2" },
        { "si-073, si-208", "1H NMR (400 MHz, CDCl3) δ 8.03 (d, J = 7.6 Hz, 2H, aromatic CH), 9.35 (s, 1 H, arom.), 7.60 (m, 2 H, aromatic CH and CH=CHCOPh)",
            "1H 400 CDCl3 | 8.03 d J7.6 n2 @aromatic CH ; 9.35 s n1 @arom. ; 7.6 m n2 @aromatic CH and CH=CHCOPh" },
        // 13C: DEPT/APT labels and carbon counts written with them.
        { Common, "13C NMR (101 MHz, CDCl3) δ 171.2 (C), 128.5 (2×CH), 128.1 (CH), 65.3 (CH2), 21.0 (CH3), 137.9 (Cq)",
            "13C 101 CDCl3 | 171.2 @C ; 128.5 c2 @2×CH ; 128.1 @CH ; 65.3 @CH2 ; 21 @CH3 ; 137.9 @Cq" },
        { "si-104", "13C NMR (101 MHz, CDCl3) δ 129.0 (CH × 2)", "13C 101 CDCl3 | 129 c2 @CH × 2" },
        { "si-038", "δC(100.6 MHz; CDCl3) 9.0 (q), 129.3 (2 × d), 131.1 (s)", "13C 100.6 CDCl3 | 9 q ; 129.3 d c2 ; 131.1 s" },
        // 13C: typed C–F couplings.
        { Common, "13C NMR (101 MHz, CDCl3) δ 162.4 (d, 1JC–F = 246.0 Hz), 115.4 (d, JC-F = 21.5 Hz), 130.0 (d, 3JC,F = 8.1 Hz)",
            "13C 101 CDCl3 | 162.4 d J1:246F ; 115.4 d J21.5F ; 130 d J3:8.1F" },
        { "si-012", "13C{1H} NMR (126 MHz, CDCl3) δ 165.8 (C−F, 1JC−F = 267.5 Hz), 132.6", "13C{1H} 126 CDCl3 | 165.8 J1:267.5F @C−F ; 132.6" },
        { Common, "13C NMR (101 MHz, CDCl3) δ 115.4 (d, 2JC,F = 21.5 Hz)", "13C 101 CDCl3 | 115.4 d J2:21.5F" },
    };

    [Theory]
    [MemberData(nameof(Rows))]
    public void Read_RealWorldSpelling_GivesExpectedSpectra(string source, string text, string expected)
    {
        Assert.False(string.IsNullOrEmpty(source));
        var result = ReportedTextReader.Read(text);
        Assert.True(result.Succeeded, string.Join(Environment.NewLine, result.Problems.Select(p => p.Message)));
        Assert.Empty(result.Problems);
        Assert.Equal(expected, string.Join(" || ", result.Spectra.Select(SpectrumDescription.Of)));
    }

    // Every spelling read here survives the formatter: format → read gives the same spectra, notes included.
    [Theory]
    [MemberData(nameof(Rows))]
    public void Format_RealWorldSpelling_ReadsBackTheSame(string source, string text, string expected)
    {
        Assert.False(string.IsNullOrEmpty(source));
        var formatted = ReportedTextFormatter.Format(ReportedTextReader.Read(text).Spectra);
        var again = ReportedTextReader.Read(formatted);
        Assert.True(again.Problems.Count == 0, formatted + Environment.NewLine + string.Join(Environment.NewLine, again.Problems.Select(p => p.Message)));
        Assert.Equal(expected, string.Join(" || ", again.Spectra.Select(SpectrumDescription.Of)));
    }
}
