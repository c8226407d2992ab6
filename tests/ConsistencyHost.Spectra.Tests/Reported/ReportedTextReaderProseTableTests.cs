using ConsistencyHost.Spectra.Reported;

namespace ConsistencyHost.Spectra.Tests.Reported;

/// <summary>
/// The non-NMR prose of a pasted characterisation paragraph (issue 13 item 1: Rf, mp, IR, "Anal. Calcd …", yield,
/// [α]D), in the clause forms of ACS/RSC experimental sections (common practice; values invented for the form):
/// a lenient read skips each clause with its kind and reads every signal, never a number of the prose as a peak;
/// a strict read refuses the paragraph.
/// </summary>
public sealed class ReportedTextReaderProseTableTests
{
    private const string H = "1H NMR (400 MHz, CDCl3) δ 7.26 (d, J = 8.0 Hz, 2H), 2.35 (s, 3H).";

    // text, the skipped kinds in text order, the signals read
    public static TheoryData<string, string, string> Rows => new()
    {
        { "Rf = 0.35 (hexanes/EtOAc 4:1). " + H, "Rf", "7.26 ; 2.35" },
        { "Rf 0.35 (SiO2, 20% EtOAc in hexanes); mp 121–123 °C. " + H, "Rf, mp", "7.26 ; 2.35" },
        { "White solid, mp 121–123 °C. " + H, "appearance", "7.26 ; 2.35" },
        { H + " IR (neat) ν 2925, 1715, 1240 cm−1.", "IR", "7.26 ; 2.35" },
        { H + " FTIR (ATR): 3310, 1650 cm-1.", "IR", "7.26 ; 2.35" },
        { H + " Anal. Calcd for C10H12O2: C, 73.15; H, 7.37. Found: C, 73.02; H, 7.41.", "elemental analysis", "7.26 ; 2.35" },
        { "Yield: 92% (1.23 g). " + H, "yield", "7.26 ; 2.35" },
        { "92% yield. " + H, "yield", "7.26 ; 2.35" },
        { "[α]D20 +12.5 (c 1.0, CHCl3). " + H, "optical rotation", "7.26 ; 2.35" },
        { H + " [α]D = −8.1 (c 0.5, MeOH).", "optical rotation", "7.26 ; 2.35" },
    };

    [Theory]
    [MemberData(nameof(Rows))]
    public void Read_ProseClause_LenientSkipsItWithItsKindAndReadsEverySignal(string text, string kinds, string signals)
    {
        var lenient = ReportedTextReader.Read(text, ReadMode.Lenient);

        Assert.True(lenient.Problems.Count == 0, string.Join(Environment.NewLine, lenient.Problems.Select(p => p.Message)));
        Assert.Equal(kinds, string.Join(", ", lenient.Skipped.Select(s => s.Kind).Distinct()));
        Assert.All(lenient.Skipped, s => Assert.StartsWith(s.Fragment, text[s.Offset..], StringComparison.Ordinal));
        Assert.Equal(signals, string.Join(" ; ", Assert.Single(lenient.Spectra).Signals.Select(s => s.ShiftPpm!.Value.ToString(System.Globalization.CultureInfo.InvariantCulture))));
    }

    [Theory]
    [MemberData(nameof(Rows))]
    public void Read_ProseClause_StrictRefusesTheParagraph(string text, string kinds, string signals)
    {
        Assert.False(string.IsNullOrEmpty(kinds + signals));
        var strict = ReportedTextReader.Read(text);

        Assert.False(strict.Succeeded);
        Assert.Empty(strict.Spectra);
        Assert.NotEmpty(strict.Problems);
    }
}
