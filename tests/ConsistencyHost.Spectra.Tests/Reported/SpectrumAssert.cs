using ConsistencyHost.Spectra.Model;

namespace ConsistencyHost.Spectra.Tests.Reported;

/// <summary>Field-by-field equality of spectra (records compare lists by reference, so this spells it out).</summary>
internal static class SpectrumAssert
{
    public static void Equivalent(Spectrum expected, Spectrum actual)
    {
        Assert.Equal((expected.Nucleus, expected.FrequencyMHz, expected.Solvent, expected.TemperatureK, expected.Decoupled),
            (actual.Nucleus, actual.FrequencyMHz, actual.Solvent, actual.TemperatureK, actual.Decoupled));
        Assert.Equal(expected.Signals.Count, actual.Signals.Count);
        for (var i = 0; i < expected.Signals.Count; i++) Equivalent(expected.Signals[i], actual.Signals[i]);
    }

    public static void Equivalent(Signal e, Signal a)
    {
        Assert.Equal((e.ShiftPpm, e.RangeLowPpm, e.RangeHighPpm, e.Multiplicity), (a.ShiftPpm, a.RangeLowPpm, a.RangeHighPpm, a.Multiplicity));
        Assert.Equal((e.ProtonCount, e.CarbonCount, e.NucleusCount), (a.ProtonCount, a.CarbonCount, a.NucleusCount));
        Assert.Equal(e.Couplings.Select(j => (j.Hz, j.CoupledNucleus, j.BondCount)), a.Couplings.Select(j => (j.Hz, j.CoupledNucleus, j.BondCount)));
        Assert.Equal(e.Assignments, a.Assignments);
        Assert.Equal(e.Notes, a.Notes);
    }
}
