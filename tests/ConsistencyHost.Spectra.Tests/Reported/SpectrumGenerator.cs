using ConsistencyHost.Spectra.Model;

namespace ConsistencyHost.Spectra.Tests.Reported;

/// <summary>Seeded random spectra for round-trip properties; vocabulary from the parse-table forms (Common practice).</summary>
internal sealed class SpectrumGenerator(int seed)
{
    private static readonly string[] ProtonMultiplicities =
        ["s", "d", "t", "q", "dd", "td", "ddd", "dq", "quint", "sext", "sept", "m", "br s", "app t", "ABq", "br d", ""];
    private static readonly string[] ProtonAssignments = ["H-3", "ArH", "OCH3", "CH2", "H-1'", "NH"];
    private static readonly string[] CarbonAssignments = ["C=O", "CF3", "C-4", "OCH3"];
    private static readonly string[] Notes = ["minor rotamer", "major rotamer", "exchangeable with D2O", "*"];
    private static readonly string[] Solvents = ["CDCl3", "DMSO-d6", "CD3OD", "acetone-d6", "C6D6", "CD2Cl2"];

    private readonly Random random = new(seed);

    public Spectrum Next()
    {
        var nucleus = Pick([Nucleus.H1, Nucleus.C13, Nucleus.F19, Nucleus.P31]);
        var count = random.Next(1, 26);
        return new Spectrum
        {
            Nucleus = nucleus,
            FrequencyMHz = Maybe(() => (double)Pick([400, 500, 101, 126, 376, 162, 600.13])),
            Solvent = Maybe(() => Pick(Solvents)),
            TemperatureK = Maybe(() => (double)Pick([298, 300, 253.15])),
            Decoupled = nucleus != Nucleus.H1 && random.Next(2) == 0 ? "1H" : null,
            Signals = [.. Enumerable.Range(0, count).Select(_ => NextSignal(nucleus))],
        };
    }

    private Signal NextSignal(Nucleus nucleus) => nucleus switch
    {
        Nucleus.H1 => Proton(),
        Nucleus.C13 => Carbon(),
        _ => Hetero(nucleus),
    };

    private Signal Proton()
    {
        var multiplicity = Pick(ProtonMultiplicities);
        var jCount = Multiplicity.Parse(multiplicity).ExpectedCouplingCount() ?? random.Next(0, 2);
        var (shift, low, high) = Position(0, 12, 2);
        return new Signal
        {
            ShiftPpm = shift, RangeLowPpm = low, RangeHighPpm = high,
            Multiplicity = multiplicity,
            Couplings = [.. Enumerable.Range(0, multiplicity.Length == 0 ? 0 : jCount).Select(_ => Coupling("F"))],
            ProtonCount = random.Next(1, 10),
            Assignments = random.Next(3) == 0 ? [Pick(ProtonAssignments)] : [],
            Notes = random.Next(5) == 0 ? [Pick(Notes)] : [],
        };
    }

    private Signal Carbon()
    {
        var split = random.Next(4) == 0;
        return new Signal
        {
            ShiftPpm = Math.Round(random.NextDouble() * 220, random.Next(1, 3)),
            Multiplicity = split ? Pick(["d", "q"]) : "",
            Couplings = split ? [Coupling("F") with { CoupledNucleus = "F" }] : [],
            CarbonCount = random.Next(4) == 0 ? 2 : null,
            Assignments = random.Next(4) == 0 ? [Pick(CarbonAssignments)] : [],
        };
    }

    private Signal Hetero(Nucleus nucleus)
    {
        var (shift, low, high) = nucleus == Nucleus.F19 ? Position(-220, -50, 1) : Position(-20, 60, 1);
        return new Signal
        {
            ShiftPpm = shift, RangeLowPpm = low, RangeHighPpm = high,
            Multiplicity = Pick(["s", "d", "t", "m"]),
            NucleusCount = random.Next(3) == 0 ? random.Next(1, 4) : null,
        };
    }

    private (double? Shift, double? Low, double? High) Position(double min, double max, int decimals)
    {
        var a = Math.Round(min + random.NextDouble() * (max - min), decimals);
        if (random.Next(5) != 0) return (a, null, null);
        var b = Math.Round(a + 0.01 + random.NextDouble() * 0.5, decimals);
        return b > a ? (null, a, b) : (a, null, null);
    }

    private Coupling Coupling(string heteroNucleus)
    {
        var typed = random.Next(6) == 0;
        return new Coupling(Math.Round(0.5 + random.NextDouble() * 17, 1), null, typed ? heteroNucleus : null)
        {
            BondCount = typed && random.Next(2) == 0 ? random.Next(2, 5) : null,
        };
    }

    private T Pick<T>(T[] items) => items[random.Next(items.Length)];

    private T? Maybe<T>(Func<T> make) => random.Next(4) == 0 ? default : make();
}
