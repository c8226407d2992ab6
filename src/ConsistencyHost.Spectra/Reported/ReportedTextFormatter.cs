using System.Globalization;
using System.Text;
using ConsistencyHost.Spectra.Model;

namespace ConsistencyHost.Spectra.Reported;

/// <summary>
/// Writes a spectrum in one consistent journal style that <see cref="ReportedTextReader"/> reads back unchanged:
/// <c>1H NMR (400 MHz, CDCl3, 298 K) δ 7.31–7.24 (m, 5H), 4.12 (q, J = 7.1 Hz, 2H, OCH2).</c>
/// </summary>
/// <remarks>
/// ACS order inside the details (multiplicity, couplings, count, assignments, notes). Typed couplings are written
/// "J(H,F) = … Hz"; in 13C lists every coupling is typed, because the reader takes an untyped 13C splitting as C–F.
/// Not written: coupling partner labels and raw integrals, which the journal form has no place for.
/// </remarks>
public static class ReportedTextFormatter
{
    /// <summary>Formats one spectrum as a header and its signal list, ending with '.'.</summary>
    public static string Format(Spectrum spectrum)
    {
        ArgumentNullException.ThrowIfNull(spectrum);
        var text = new StringBuilder();
        AppendHeader(text, spectrum);
        for (var i = 0; i < spectrum.Signals.Count; i++)
        {
            if (i > 0) text.Append(", ");
            AppendSignal(text, spectrum.Signals[i], spectrum.Nucleus);
        }
        return text.Append('.').ToString();
    }

    /// <summary>Formats several spectra, one per line.</summary>
    public static string Format(IEnumerable<Spectrum> spectra) => string.Join('\n', spectra.Select(Format));

    private static void AppendHeader(StringBuilder text, Spectrum s)
    {
        text.Append(s.Nucleus.ToLabel());
        if (s.Decoupled is { } decoupled) text.Append('{').Append(decoupled).Append('}');
        text.Append(" NMR");
        var items = new List<string>();
        if (s.FrequencyMHz is { } f) items.Add(N(f) + " MHz");
        if (s.Solvent is { } solvent) items.Add(solvent);
        if (s.TemperatureK is { } t) items.Add(N(t) + " K");
        // Spectrum notes ("rotamers 6:4", "OH not observed") read back as header notes.
        items.AddRange(s.Notes);
        if (items.Count > 0) text.Append(" (").AppendJoin(", ", items).Append(')');
        text.Append(" δ ");
    }

    private static void AppendSignal(StringBuilder text, Signal signal, Nucleus nucleus)
    {
        text.Append(signal.ShiftPpm is { } x ? N(x) : N(signal.RangeLowPpm ?? 0) + "–" + N(signal.RangeHighPpm ?? 0));
        if (signal.Notes.Contains("*")) text.Append('*');
        var details = Details(signal, nucleus);
        if (details.Count > 0) text.Append(" (").AppendJoin(", ", details).Append(')');
    }

    private static List<string> Details(Signal signal, Nucleus nucleus)
    {
        var items = new List<string>();
        if (signal.Multiplicity.Length > 0) items.Add(signal.Multiplicity);
        items.AddRange(Couplings(signal.Couplings, nucleus));
        if (signal.ProtonCount is { } h) items.Add(N(h) + "H");
        if (signal.CarbonCount is { } c) items.Add(c.ToString(CultureInfo.InvariantCulture) + "C");
        if (signal.NucleusCount is { } n) items.Add(n.ToString(CultureInfo.InvariantCulture) + (nucleus == Nucleus.P31 ? "P" : "F"));
        items.AddRange(signal.Assignments);
        items.AddRange(signal.Notes.Where(note => note != "*"));
        return items;
    }

    /// <summary>Runs of untyped couplings share one "J = a, b Hz"; each typed one is written on its own.</summary>
    private static IEnumerable<string> Couplings(IReadOnlyList<Coupling> couplings, Nucleus nucleus)
    {
        var i = 0;
        while (i < couplings.Count)
        {
            var prefix = Prefix(couplings[i], nucleus);
            var run = new List<string> { N(couplings[i].Hz) };
            while (++i < couplings.Count && prefix.StartsWith("J =", StringComparison.Ordinal)
                   && Prefix(couplings[i], nucleus) == prefix) run.Add(N(couplings[i].Hz));
            yield return prefix + " " + string.Join(", ", run) + " Hz";
        }
    }

    private static string Prefix(Coupling j, Nucleus nucleus)
    {
        var own = nucleus switch { Nucleus.C13 => "C", Nucleus.F19 => "F", Nucleus.P31 => "P", _ => "H" };
        var bonds = j.BondCount?.ToString(CultureInfo.InvariantCulture) ?? "";
        var other = j.CoupledNucleus ?? own;
        var typed = nucleus == Nucleus.C13 || j.CoupledNucleus is not null;
        return typed ? $"{bonds}J({own},{other}) =" : $"{bonds}J =";
    }

    private static string N(double value) => value.ToString("R", CultureInfo.InvariantCulture);
}
