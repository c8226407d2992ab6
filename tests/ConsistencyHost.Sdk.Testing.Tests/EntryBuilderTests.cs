using ConsistencyHost.Sdk.Entries;
using ConsistencyHost.Sdk.Testing.Entries;
using ConsistencyHost.Spectra.Model;

namespace ConsistencyHost.Sdk.Testing.Tests;

public sealed class EntryBuilderTests
{
    [Fact]
    public void Build_StructureSpectraAndFormula_AreCarriedAsGiven()
    {
        // Ethyl acetate 13C in CDCl3: 171.36, 60.49, 21.04, 14.19. Source: Fulmer et al., Organometallics 2010, 29, 2176 (Table 2).
        var entry = EntryBuilder.Entry("AIS-LQ-0502").Smiles("CCOC(C)=O").Formula("C4H8O2")
            .Spectrum(SpectrumBuilder.Carbon(101, "CDCl3").Line(171.36).Line(60.49).Line(21.04).Line(14.19))
            .Build();

        Assert.Equal(new StructureSource(StructureFormat.Smiles, "CCOC(C)=O"), entry.Structure);
        Assert.Equal("C4H8O2", entry.Claims.Formula);
        var carbon = Assert.Single(entry.Spectra);
        Assert.Equal(Nucleus.C13, carbon.Nucleus);
        Assert.Equal([171.36, 60.49, 21.04, 14.19], carbon.Signals.Select(s => s.ShiftPpm!.Value));
    }

    [Fact]
    public void Build_ReportedTextAddedFirst_FollowsTheStructuredSpectraAsInTheHost()
    {
        IReadOnlyList<Spectrum> Reader(string text) => [new Spectrum { Nucleus = NucleusNames.Parse(text[..2]) }];

        var entry = EntryBuilder.Entry("AIS-LQ-0503")
            .ReportedText("1H NMR (400 MHz, CDCl3) δ 2.05 (s, 3H)", Reader)
            .Spectrum(SpectrumBuilder.Carbon())
            .Build();

        Assert.Equal([Nucleus.C13, Nucleus.H1], entry.Spectra.Select(s => s.Nucleus));
    }

    [Fact]
    public void Signal_RangeWrittenHighToLow_IsStoredLowToHigh()
    {
        var spectrum = SpectrumBuilder.Proton().Range(7.31, 7.24, "m", 5).Build();

        var signal = Assert.Single(spectrum.Signals);
        Assert.Equal((7.24, 7.31), (signal.RangeLowPpm!.Value, signal.RangeHighPpm!.Value));
    }

    [Fact]
    public void Entry_BlankId_IsRejected() =>
        Assert.Throws<ArgumentException>(() => EntryBuilder.Entry(" "));
}
