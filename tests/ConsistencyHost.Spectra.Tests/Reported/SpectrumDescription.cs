using System.Globalization;
using ConsistencyHost.Spectra.Model;

namespace ConsistencyHost.Spectra.Tests.Reported;

/// <summary>A compact, test-side description of a spectrum so a table row can state every read field.</summary>
internal static class SpectrumDescription
{
    public static string Of(Spectrum s)
    {
        var head = string.Join(' ', new[]
        {
            s.Nucleus.ToLabel() + (s.Decoupled is null ? "" : "{" + s.Decoupled + "}"),
            s.FrequencyMHz is { } f ? N(f) : null,
            s.Solvent,
            s.TemperatureK is { } t ? N(t) + "K" : null,
        }.Where(x => x is not null));
        var notes = string.Concat(s.Notes.Select(n => " !" + n));
        return head + notes + " | " + string.Join(" ; ", s.Signals.Select(Of));
    }

    public static string Of(Signal g)
    {
        var parts = new List<string>
        {
            g.ShiftPpm is { } x ? N(x) : $"{N(g.RangeLowPpm!.Value)}-{N(g.RangeHighPpm!.Value)}",
        };
        if (g.Multiplicity.Length > 0) parts.Add(Multiplicity.Parse(g.Multiplicity).Canonical);
        if (g.Couplings.Count > 0) parts.Add("J" + string.Join(',', g.Couplings.Select(Of)));
        if (g.ProtonCount is { } h) parts.Add("n" + N(h));
        if (g.CarbonCount is { } c) parts.Add("c" + c);
        if (g.NucleusCount is { } k) parts.Add("x" + k);
        parts.AddRange(g.Assignments.Select(a => "@" + a));
        parts.AddRange(g.Notes.Select(n => "!" + n));
        return string.Join(' ', parts);
    }

    private static string Of(Coupling j) =>
        (j.BondCount is { } b ? b + ":" : "") + N(j.Hz) + (j.CoupledNucleus ?? "") + (j.PartnerLabel is { } p ? "(" + p + ")" : "");

    private static string N(double v) => v.ToString(CultureInfo.InvariantCulture);
}
