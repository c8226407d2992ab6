using ConsistencyHost.Spectra.Reported;

namespace ConsistencyHost.Spectra.Tests.Reported;

/// <summary>
/// Each row: where the form comes from, the reported text, and the expected spectra (see SpectrumDescription).
/// Shift values are invented for the form unless the row cites a table (then they are the printed values).
/// </summary>
public sealed class ReportedTextReaderParseTableTests
{
    private const string AcsForm = "ACS NMR Guidelines (S7) canonical form, from memory";
    private const string ActaChimSlov = "Acta Chim. Slov. style page (journals.matheo.si, citing spectral data)";
    private const string RscForm = "RSC older guideline form, from memory";
    private const string Pmc9260665 = "PMC9260665 table T3";
    private const string Pmc7465223 = "PMC7465223 table plants-09-01051-t001";
    private const string Pmc10232390 = "PMC10232390 table Tab2";
    private const string Pmc4199947 = "PMC4199947 table Tab2";
    private const string Pmc9173697 = "PMC9173697 table T1";
    private const string Pmc7672018 = "PMC7672018 table T2";
    private const string PhysicsForums = "physicsforums.com thread 69647 (notation guide)";
    private const string Gottlieb = "Gottlieb, Kotlyar, Nudelman, J. Org. Chem. 1997, 62, 7512 (ethyl acetate row)";
    private const string Common = "Common practice";

    public static TheoryData<string, string, string> Rows => new()
    {
        // Headers
        { AcsForm, "1H NMR (400 MHz, CDCl3) δ 7.30 (d, J = 8.4 Hz, 2H).", "1H 400 CDCl3 | 7.3 d J8.4 n2" },
        { AcsForm, "13C NMR (101 MHz, CDCl3) δ 171.1, 60.4, 21.0, 14.2.", "13C 101 CDCl3 | 171.1 ; 60.4 ; 21 ; 14.2" },
        { Common, "13C{1H} NMR (126 MHz, CDCl3) δ 170.1, 128.5.", "13C{1H} 126 CDCl3 | 170.1 ; 128.5" },
        { Common, "13C{¹H} NMR (126 MHz, CDCl₃) δ 170.1.", "13C{1H} 126 CDCl3 | 170.1" },
        { Common, "¹H NMR (500 MHz, DMSO-d6) δ 8.09 (br s, 1H).", "1H 500 DMSO-d6 | 8.09 br s n1" },
        { RscForm, "δH (400 MHz; CDCl3; Me4Si) 7.26 (2 H, d, J 8.0, ArH)", "1H 400 CDCl3 | 7.26 d J8 n2 @ArH" },
        { RscForm, "δC (101 MHz; CDCl3) 171.4, 60.5", "13C 101 CDCl3 | 171.4 ; 60.5" },
        { PhysicsForums, "1H-NMR (CDCl3) δ: 1.09 (3H, t, CH3)", "1H CDCl3 | 1.09 t n3 @CH3" },
        { ActaChimSlov, "1H NMR (500 MHz, DMSO-d6) d 0.85 (s, 3H, CH3)", "1H 500 DMSO-d6 | 0.85 s n3 @CH3" },
        { Common, "1H NMR (400 MHz, CDCl3) delta 7.26 (s, 1H)", "1H 400 CDCl3 | 7.26 s n1" },
        { Common, "1H NMR (400 MHz, CDCl3) δ (ppm) 2.05 (s, 3H)", "1H 400 CDCl3 | 2.05 s n3" },
        { Common, "1H NMR (400 MHz, CDCl3, 298 K) δ 2.05 (s, 3H)", "1H 400 CDCl3 298K | 2.05 s n3" },
        { Common, "1H NMR (600 MHz, CD3OD, 25 °C) δ 2.05 (s, 3H)", "1H 600 CD3OD 298.15K | 2.05 s n3" },
        { Common, "1H NMR (CDCl3, 400 MHz): δ 2.05 (s, 3H)", "1H 400 CDCl3 | 2.05 s n3" },
        { Common, "1H NMR (400 MHz, d6-DMSO) δ 2.05 (s, 3H)", "1H 400 DMSO-d6 | 2.05 s n3" },
        { Common, "1H NMR (400 MHz, chloroform-d) δ 2.05 (s, 3H)", "1H 400 CDCl3 | 2.05 s n3" },
        { Common, "1H NMR (400 MHz, acetone-d6) δ 2.05 (s, 3H)", "1H 400 acetone-d6 | 2.05 s n3" },
        { Common, "1H NMR (400 MHz, C6D6) δ 2.05 (s, 3H)", "1H 400 C6D6 | 2.05 s n3" },
        { Common, "1H NMR (400 MHz, methanol-d4) δ 2.05 (s, 3H)", "1H 400 CD3OD | 2.05 s n3" },
        { Common, "19F NMR (376 MHz, CDCl3) δ -62.8 (s, 3F).", "19F 376 CDCl3 | -62.8 s x3" },
        { Common, "19F{1H} NMR (376 MHz, CDCl3) δ −113.5 (s).", "19F{1H} 376 CDCl3 | -113.5 s" },
        { Common, "31P NMR (162 MHz, CDCl3) δ 29.5 (s).", "31P 162 CDCl3 | 29.5 s" },
        { Common, "31P{1H} NMR (162 MHz, CDCl3) δ 29.5, 27.1.", "31P{1H} 162 CDCl3 | 29.5 ; 27.1" },
        { Common, "1H NMR (400 MHz, CDCl3) δ 7.26 ppm (s, 1H), 2.05 ppm (s, 3H).", "1H 400 CDCl3 | 7.26 s n1 ; 2.05 s n3" },
        { Common, "13C NMR (101 MHz, CDCl3) δ 171.1, 60.4 ppm.", "13C 101 CDCl3 | 171.1 ; 60.4" },
        // Ranges
        { ActaChimSlov, "1H NMR (500 MHz, DMSO-d6) δ 1.28–1.65 (m, 8H, 4×CH2)", "1H 500 DMSO-d6 | 1.28-1.65 m n8 @4×CH2" },
        { Pmc9260665, "1H NMR (500 MHz, CDCl3) δ 4.56–4.48 (m, 1 H), 1.86–1.79 (m, 6 H)", "1H 500 CDCl3 | 4.48-4.56 m n1 ; 1.79-1.86 m n6" },
        { PhysicsForums, "1H NMR (CDCl3) δ 3.97-4.28 (2H, m, CH2), 8.53 (1H, d, J=5.2Hz, ArH)", "1H CDCl3 | 3.97-4.28 m n2 @CH2 ; 8.53 d J5.2 n1 @ArH" },
        { Common, "1H NMR (400 MHz, CDCl3) δ 7.31 – 7.24 (m, 5H)", "1H 400 CDCl3 | 7.24-7.31 m n5" },
        // Couplings
        { ActaChimSlov, "1H NMR (500 MHz, DMSO-d6) δ 7.41 (d, J 8.2 Hz, 1H, ArH)", "1H 500 DMSO-d6 | 7.41 d J8.2 n1 @ArH" },
        { ActaChimSlov, "1H NMR (500 MHz, DMSO-d6) δ 7.76 (dd, J 6.0, 8.2 Hz, 1H, H-1')", "1H 500 DMSO-d6 | 7.76 dd J6,8.2 n1 @H-1'" },
        { ActaChimSlov, "1H NMR (500 MHz, DMSO-d6) δ 4.36–4.55 (m, 2H, H-1 and H-2)", "1H 500 DMSO-d6 | 4.36-4.55 m n2 @H-1 and H-2" },
        { Pmc9260665, "1H NMR (500 MHz, CDCl3) δ 6.22 (d, 9.6 Hz, 1 H), 7.16 (dd, 9.6, 5.9 Hz, 1 H)", "1H 500 CDCl3 | 6.22 d J9.6 n1 ; 7.16 dd J9.6,5.9 n1" },
        { Pmc10232390, "1H NMR (400 MHz, CDCl3) δ 5.79 (1H, s), 3.95 (1H, q, 6.6), 0.99 (3H, d, 6.7)", "1H 400 CDCl3 | 5.79 s n1 ; 3.95 q J6.6 n1 ; 0.99 d J6.7 n3" },
        { Common, "1H NMR (400 MHz, CDCl3) δ 7.05 (dd, J = 8.0, 2.0 Hz, 1H)", "1H 400 CDCl3 | 7.05 dd J8,2 n1" },
        { Common, "1H NMR (400 MHz, CDCl3) δ 7.05 (dd, J = 8.0 and 2.0 Hz, 1H)", "1H 400 CDCl3 | 7.05 dd J8,2 n1" },
        { Common, "1H NMR (400 MHz, CDCl3) δ 7.05 (dd, J = 8.0 Hz, 2.0 Hz, 1H)", "1H 400 CDCl3 | 7.05 dd J8,2 n1" },
        { Common, "1H NMR (400 MHz, CDCl3) δ 7.05 (dd, J1 = 8.0 Hz, J2 = 2.0 Hz, 1H)", "1H 400 CDCl3 | 7.05 dd J8,2 n1" },
        { Common, "1H NMR (400 MHz, CDCl3) δ 7.05 (dd, J(H,F) = 8.9 Hz, J = 5.5 Hz, 1H)", "1H 400 CDCl3 | 7.05 dd J8.9F,5.5 n1" },
        { Common, "1H NMR (400 MHz, CDCl3) δ 5.35 (d, JHF = 47.5 Hz, 2H)", "1H 400 CDCl3 | 5.35 d J47.5F n2" },
        { Common, "1H NMR (400 MHz, CDCl3) δ 5.35 (d, 2JHF = 47.5 Hz, 2H)", "1H 400 CDCl3 | 5.35 d J2:47.5F n2" },
        { Common, "1H NMR (400 MHz, CDCl3) δ 7.02 (t, J = 8.7 Hz (H-F), 2H)", "1H 400 CDCl3 | 7.02 t J8.7F n2" },
        { Common, "1H NMR (400 MHz, CDCl3) δ 7.02 (dd, J = 8.0, ⁴J(H,F) = 5.5 Hz, 1H)", "1H 400 CDCl3 | 7.02 dd J8,4:5.5F n1" },
        { Common, "1H NMR (400 MHz, CDCl3) δ 7.02 (dd, J(H2,H3) = 8.0 Hz, J = 2.0 Hz, 1H, H-2)", "1H 400 CDCl3 | 7.02 dd J8(H2,H3),2 n1 @H-2" },
        { Common, "1H NMR (400 MHz, CDCl3) δ 3.70 (ABq, JAB = 12.0 Hz, 2H)", "1H 400 CDCl3 | 3.7 ABq J12 n2" },
        // Multiplicities
        { Pmc4199947, "1H NMR (400 MHz, CDCl3) δ 5.02 (bs, 1H)", "1H 400 CDCl3 | 5.02 br s n1" },
        { Pmc9173697, "1H NMR (400 MHz, CDCl3) δ 2.41 (br. t, 7.8, 2H)", "1H 400 CDCl3 | 2.41 br t J7.8 n2" },
        { Pmc9173697, "1H NMR (400 MHz, CDCl3) δ 4.33 (p, 6.4, 1H)", "1H 400 CDCl3 | 4.33 quint J6.4 n1" },
        { Common, "1H NMR (400 MHz, CDCl3) δ 1.62 (quint, J = 7.4 Hz, 2H)", "1H 400 CDCl3 | 1.62 quint J7.4 n2" },
        { Common, "1H NMR (400 MHz, CDCl3) δ 1.62 (pent, J = 7.4 Hz, 2H)", "1H 400 CDCl3 | 1.62 quint J7.4 n2" },
        { Common, "1H NMR (400 MHz, CDCl3) δ 1.45 (sext, J = 7.4 Hz, 2H)", "1H 400 CDCl3 | 1.45 sext J7.4 n2" },
        { Common, "1H NMR (400 MHz, CDCl3) δ 2.90 (hept, J = 6.9 Hz, 1H)", "1H 400 CDCl3 | 2.9 sept J6.9 n1" },
        { Common, "1H NMR (400 MHz, CDCl3) δ 2.90 (sept, J = 6.9 Hz, 1H)", "1H 400 CDCl3 | 2.9 sept J6.9 n1" },
        { Common, "1H NMR (400 MHz, CDCl3) δ 7.20 (app t, J = 7.8 Hz, 1H)", "1H 400 CDCl3 | 7.2 app t J7.8 n1" },
        { Pmc9173697, "1H NMR (400 MHz, CDCl3) δ 5.93 (dq, 15.7, 6.6, 1H)", "1H 400 CDCl3 | 5.93 dq J15.7,6.6 n1" },
        { Pmc7672018, "1H NMR (400 MHz, CDCl3) δ 3.38 (ddd, 6.5, 5.8, 3.2, 1H)", "1H 400 CDCl3 | 3.38 ddd J6.5,5.8,3.2 n1" },
        { Pmc7672018, "1H NMR (400 MHz, CDCl3) δ 5.70 (dt, 15.0, 7.3, 1H)", "1H 400 CDCl3 | 5.7 dt J15,7.3 n1" },
        { Common, "1H NMR (400 MHz, CDCl3) δ 2.31 (td, J = 7.5, 2.6 Hz, 2H)", "1H 400 CDCl3 | 2.31 td J7.5,2.6 n2" },
        { Common, "1H NMR (400 MHz, CDCl3) δ 1.98 (dddd, J = 13.0, 9.1, 7.0, 4.2 Hz, 1H)", "1H 400 CDCl3 | 1.98 dddd J13,9.1,7,4.2 n1" },
        { Common, "1H NMR (400 MHz, CDCl3) δ 2.03 (overlapped, 2H)", "1H 400 CDCl3 | 2.03 m n2" },
        { Common, "1H NMR (400 MHz, CDCl3) δ 2.03 (m, 2H, overlapped)", "1H 400 CDCl3 | 2.03 m n2 !overlapped" },
        // Table-cell forms (details after a comma)
        { Pmc7465223, "1H NMR (500 MHz, CD3OD) δ 7.28, d (8.5); 7.06, dd (8.0, 1.5); 3.57, q (7.0)", "1H 500 CD3OD | 7.28 d J8.5 ; 7.06 dd J8,1.5 ; 3.57 q J7" },
        { Pmc4199947, "1H NMR (400 MHz, CDCl3) δ 1.31, d (6.4), 3H; 1.65, m, 2H; 2.03, overlapped", "1H 400 CDCl3 | 1.31 d J6.4 n3 ; 1.65 m n2 ; 2.03 m" },
        // Decimal commas
        { PhysicsForums, "1H NMR (CDCl3) δ 1,47 (s, 9H) ; 4,27 (ls, 1H)", "1H CDCl3 | 1.47 s n9 ; 4.27 br s n1" },
        { Common, "1H NMR (400 MHz, CDCl3) δ 7,26 (d, J = 8,4 Hz, 2H); 2,05 (s, 3H)", "1H 400 CDCl3 | 7.26 d J8.4 n2 ; 2.05 s n3" },
        // 13C forms
        { Common, "13C NMR (101 MHz, CDCl3) δ 128.9 (2C), 127.5 (2 C)", "13C 101 CDCl3 | 128.9 c2 ; 127.5 c2" },
        { Common, "13C NMR (101 MHz, CDCl3) δ 162.4 (d, J = 245.3 Hz), 124.1 (q, J = 272.0 Hz, CF3)", "13C 101 CDCl3 | 162.4 d J245.3F ; 124.1 q J272F @CF3" },
        { Common, "13C NMR (101 MHz, CDCl3) δ 115.6 (d, J(C,F) = 21.4 Hz, 2C)", "13C 101 CDCl3 | 115.6 d J21.4F c2" },
        { Common, "13C NMR (101 MHz, CDCl3) δ 171.3 (C=O), 55.2 (OCH3)", "13C 101 CDCl3 | 171.3 @C=O ; 55.2 @OCH3" },
        // Notes
        { Common, "1H NMR (400 MHz, CDCl3) δ 5.10 (br s, 1H, exchangeable with D2O)", "1H 400 CDCl3 | 5.1 br s n1 !exchangeable with D2O" },
        { Common, "1H NMR (400 MHz, CDCl3) δ 3.41 (s, 3H, minor rotamer), 3.38 (s, 3H, major rotamer)", "1H 400 CDCl3 | 3.41 s n3 !minor rotamer ; 3.38 s n3 !major rotamer" },
        { Common, "1H NMR (400 MHz, CDCl3) δ 3.41 (s, 3H, rotamers 3:1), 3.38 (s, 3H, signals doubled due to rotamers)", "1H 400 CDCl3 | 3.41 s n3 !rotamers 3:1 ; 3.38 s n3 !signals doubled due to rotamers" },
        { Common, "1H NMR (400 MHz, CDCl3) δ 3.95 (AB quartet, J = 15.1 Hz, 2H)", "1H 400 CDCl3 | 3.95 AB quartet J15.1 n2" },
        { Common, "1H NMR (400 MHz, CDCl3) δ 9.10 (br, 1H, NH), 1.42 (s, 9H, 3 × CH3)", "1H 400 CDCl3 | 9.1 br m n1 @NH ; 1.42 s n9 @3 × CH3" },
        { Common, "13C NMR (101 MHz, CDCl3) δ 128.5 (2 x CH), 127.9 (2×CH)", "13C 101 CDCl3 | 128.5 c2 @2 x CH ; 127.9 c2 @2×CH" },
        { Common, "1H NMR (400 MHz, CDCl3) δ 7.30–7.22 (m, 2H, overlapping with CHCl3)", "1H 400 CDCl3 | 7.22-7.3 m n2 !overlapping with CHCl3" },
        { Common, "1H NMR (400 MHz, CDCl3) δ 3.41* (s, 3H)", "1H 400 CDCl3 | 3.41 s n3 !*" },
        // Several spectra and HRMS in one text
        { Gottlieb, "1H NMR (300 MHz, CDCl3) δ 4.12 (q, J = 7 Hz, 2H), 2.05 (s, 3H), 1.26 (t, J = 7 Hz, 3H); 13C NMR (75 MHz, CDCl3) δ 171.36, 60.49, 21.04, 14.19.",
            "1H 300 CDCl3 | 4.12 q J7 n2 ; 2.05 s n3 ; 1.26 t J7 n3 || 13C 75 CDCl3 | 171.36 ; 60.49 ; 21.04 ; 14.19" },
        { Common, "1H NMR (400 MHz, CDCl3) δ 2.05 (s, 3H)\n13C NMR (101 MHz, CDCl3) δ 171.1\n19F NMR (376 MHz, CDCl3) δ -63.1",
            "1H 400 CDCl3 | 2.05 s n3 || 13C 101 CDCl3 | 171.1 || 19F 376 CDCl3 | -63.1" },
    };

    [Theory]
    [MemberData(nameof(Rows))]
    public void Read_PublishedForm_GivesExpectedSpectra(string source, string text, string expected)
    {
        Assert.False(string.IsNullOrEmpty(source));
        var result = ReportedTextReader.Read(text);
        Assert.True(result.Succeeded, string.Join(Environment.NewLine, result.Problems.Select(p => p.Message)));
        Assert.Equal(expected, string.Join(" || ", result.Spectra.Select(SpectrumDescription.Of)));
    }
}
