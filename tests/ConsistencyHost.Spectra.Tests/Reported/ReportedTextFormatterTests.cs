using ConsistencyHost.Spectra.Model;
using ConsistencyHost.Spectra.Reported;

namespace ConsistencyHost.Spectra.Tests.Reported;

public sealed class ReportedTextFormatterTests
{
    // Source: Gottlieb 1997 Table 1/2 ethyl acetate in CDCl3 (4.12 q 7, 2.05 s, 1.26 t 7; 171.36, 60.49, 21.04, 14.19).
    [Fact]
    public void Format_EthylAcetateLists_WritesAcsStyle()
    {
        var proton = new Spectrum
        {
            Nucleus = Nucleus.H1, FrequencyMHz = 300, Solvent = "CDCl3",
            Signals =
            [
                new Signal { ShiftPpm = 4.12, Multiplicity = "q", Couplings = [new Coupling(7)], ProtonCount = 2, Assignments = ["OCH2"] },
                new Signal { ShiftPpm = 2.05, Multiplicity = "s", ProtonCount = 3 },
                new Signal { ShiftPpm = 1.26, Multiplicity = "t", Couplings = [new Coupling(7)], ProtonCount = 3 },
            ],
        };
        Assert.Equal("1H NMR (300 MHz, CDCl3) δ 4.12 (q, J = 7 Hz, 2H, OCH2), 2.05 (s, 3H), 1.26 (t, J = 7 Hz, 3H).",
            ReportedTextFormatter.Format(proton));
    }

    [Fact]
    public void Format_CarbonFluorineSplitting_WritesTypedCoupling()
    {
        // Common practice: 1J(C,F) of an aryl fluoride is about 245 Hz (reference notes §6, from memory of Pretsch).
        var carbon = new Spectrum
        {
            Nucleus = Nucleus.C13, FrequencyMHz = 101, Solvent = "CDCl3", Decoupled = "1H",
            Signals = [new Signal { ShiftPpm = 162.4, Multiplicity = "d", Couplings = [new Coupling(245.3, null, "F")] }],
        };
        Assert.Equal("13C{1H} NMR (101 MHz, CDCl3) δ 162.4 (d, J(C,F) = 245.3 Hz).", ReportedTextFormatter.Format(carbon));
    }

    [Theory]
    [InlineData(1)]
    [InlineData(2)]
    [InlineData(3)]
    [InlineData(4)]
    [InlineData(5)]
    public void FormatThenRead_SeededSpectra_GivesEqualSpectra(int seed)
    {
        var generator = new SpectrumGenerator(seed);
        for (var i = 0; i < 60; i++)
        {
            var original = generator.Next();
            var text = ReportedTextFormatter.Format(original);
            var result = ReportedTextReader.Read(text);
            Assert.True(result.Succeeded, text + Environment.NewLine + string.Join("; ", result.Problems.Select(p => p.Message)));
            SpectrumAssert.Equivalent(original, Assert.Single(result.Spectra));
        }
    }

    [Theory]
    [InlineData(11)]
    [InlineData(12)]
    public void ReadFormatRead_SeededSpectra_IsStable(int seed)
    {
        var generator = new SpectrumGenerator(seed);
        var spectra = Enumerable.Range(0, 20).Select(_ => generator.Next()).ToList();
        var once = ReportedTextReader.Read(ReportedTextFormatter.Format(spectra));
        var twice = ReportedTextReader.Read(ReportedTextFormatter.Format(once.Spectra));
        Assert.True(twice.Succeeded);
        Assert.Equal(spectra.Count, twice.Spectra.Count);
        for (var i = 0; i < spectra.Count; i++) SpectrumAssert.Equivalent(once.Spectra[i], twice.Spectra[i]);
    }
}
