using System.Globalization;
using ConsistencyHost.Spectra.Model;

namespace ConsistencyHost.Spectra.Nmredata;

/// <summary>
/// Reads an NMREDATA_1D_&lt;isotope&gt; tag: header lines (Larmor=, Decoupled=, Spectrum_Location= …) and signal
/// lines "shift-or-range, S=…, J=…, N=…, L=…, E=…, W=…" in any attribute order.
/// </summary>
/// <remarks>After a comma, a field without "NAME=" continues the previous attribute (J and L lists); Pupier et al. 2018.</remarks>
internal static class OneDTagReader
{
    private static readonly HashSet<string> Ignored = new(StringComparer.OrdinalIgnoreCase) { "I", "T1", "T2", "DIFF" };

    public static Spectrum Read(Nucleus nucleus, SdTag tag, List<LogicalLine> lines, ReaderContext context)
    {
        double? larmor = null;
        var sawLarmor = false;
        string? decoupled = null;
        var signals = new List<Signal>();
        foreach (var line in lines)
        {
            if (Header(line.Text, "Larmor") is { } l)
            {
                sawLarmor = true;
                larmor = Fields.TryNumber(l, out var mhz) ? mhz : Bad(line, l, context);
            }
            else if (Header(line.Text, "Decoupled") is { } d) decoupled = Fields.Split(d)[0];
            else if (!IsHeaderLine(line.Text) && Signal(line, nucleus, context) is { } s) signals.Add(s);
        }
        if (!sawLarmor) context.Sink.Add(tag.HeaderLine, tag.Name, NmredataMessages.ExpectedLarmor, ProblemSeverity.Warning);
        return new Spectrum
        {
            Nucleus = nucleus, FrequencyMHz = larmor, Decoupled = decoupled,
            Solvent = context.Solvent, TemperatureK = context.TemperatureK, Signals = signals,
        };
    }

    private static double? Bad(LogicalLine line, string value, ReaderContext context)
    {
        context.Sink.Add(line.Line, value, NmredataMessages.ExpectedNumber);
        return null;
    }

    /// <summary>"Name=value" with an identifier name (Spectrum_Location=, Pulseprogram=, MD5_1r=, Sequence= …).</summary>
    private static bool IsHeaderLine(string text)
    {
        var equals = text.IndexOf('=');
        var comma = text.IndexOf(',');
        return equals > 0 && (comma < 0 || equals < comma) && char.IsAsciiLetter(text[0])
            && text[..equals].All(c => char.IsAsciiLetterOrDigit(c) || c == '_');
    }

    private static string? Header(string text, string name) =>
        text.StartsWith(name + "=", StringComparison.OrdinalIgnoreCase) ? text[(name.Length + 1)..].Trim() : null;

    private static Signal? Signal(LogicalLine line, Nucleus nucleus, ReaderContext context)
    {
        var fields = Fields.Split(line.Text);
        if (!Fields.TryShift(fields[0], out var shift, out var low, out var high))
        {
            context.Sink.Add(line.Line, fields[0], NmredataMessages.ExpectedShift);
            return null;
        }
        var signal = new Signal { ShiftPpm = shift, RangeLowPpm = low, RangeHighPpm = high };
        foreach (var (name, values) in Attributes(fields.Skip(1)))
            signal = Apply(signal, name, values, nucleus, line, context);
        return signal;
    }

    /// <summary>Groups fields into attributes: "J=7.1" starts one, a following "2.0" continues it.</summary>
    private static List<(string Name, List<string> Values)> Attributes(IEnumerable<string> fields)
    {
        var result = new List<(string, List<string>)>();
        foreach (var field in fields)
        {
            var equals = field.IndexOf('=');
            var isNew = equals > 0 && field[..equals].All(c => char.IsAsciiLetterOrDigit(c) || c == '_');
            if (isNew) result.Add((field[..equals], [field[(equals + 1)..].Trim()]));
            else if (result.Count > 0) result[^1].Item2.Add(field);
            else result.Add(("", [field]));
        }
        return result;
    }

    private static Signal Apply(Signal signal, string name, List<string> values, Nucleus nucleus, LogicalLine line, ReaderContext context)
    {
        switch (name.ToUpperInvariant())
        {
            case "S": return signal with { Multiplicity = values[0] };
            case "J": return signal with { Couplings = Couplings(values, line, context) };
            case "L":
                var labels = values.Select(Fields.Unquote).ToList();
                foreach (var label in labels.Where(l => !context.Labels.Contains(l) && !l.StartsWith('(')))
                    context.Sink.Add(line.Line, label, NmredataMessages.ExpectedKnownLabel, ProblemSeverity.Warning);
                return signal with { Assignments = labels };
            case "N" when int.TryParse(values[0], NumberStyles.Integer, CultureInfo.InvariantCulture, out var n):
                return nucleus switch
                {
                    Nucleus.H1 => signal with { ProtonCount = n },
                    Nucleus.C13 => signal with { AttachedHydrogenCount = n },
                    _ => signal with { NucleusCount = n },
                };
            case "E" when Fields.TryNumber(values[0], out var e): return signal with { Integral = e };
            case "W" when Fields.TryNumber(values[0], out var w): return signal with { LineWidthHz = w };
            case "N" or "E" or "W":
                context.Sink.Add(line.Line, values[0], NmredataMessages.ExpectedNumber);
                return signal;
            default:
                if (!Ignored.Contains(name)) context.Sink.Add(line.Line, name + "=" + values[0], NmredataMessages.ExpectedAttribute, ProblemSeverity.Warning);
                return signal;
        }
    }

    /// <summary>"9.30", "9.32(b)", "8.44(H28(C27))" → couplings with partner labels.</summary>
    private static List<Coupling> Couplings(List<string> values, LogicalLine line, ReaderContext context)
    {
        var result = new List<Coupling>();
        foreach (var value in values)
        {
            var open = value.IndexOf('(');
            var number = open < 0 ? value : value[..open].Trim();
            var partner = open > 0 && value.EndsWith(')') ? Fields.Unquote(value[(open + 1)..^1]) : null;
            if (!Fields.TryNumber(number, out var hz) || (open >= 0 && partner is null))
            {
                context.Sink.Add(line.Line, value, NmredataMessages.ExpectedCoupling);
                continue;
            }
            if (partner is not null && !context.Labels.Contains(partner))
                context.Sink.Add(line.Line, partner, NmredataMessages.ExpectedKnownLabel, ProblemSeverity.Warning);
            result.Add(new Coupling(hz, partner));
        }
        return result;
    }
}

/// <summary>Record-level facts the 1D reader needs.</summary>
internal sealed record ReaderContext(NmredataProblemSink Sink, HashSet<string> Labels, string? Solvent, double? TemperatureK);
