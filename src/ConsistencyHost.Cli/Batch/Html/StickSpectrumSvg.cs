using System.Text;
using ConsistencyHost.Spectra.Model;
using ConsistencyHost.Spectra.Solvents;
using static ConsistencyHost.Cli.Batch.Html.SvgText;

namespace ConsistencyHost.Cli.Batch.Html;

/// <summary>
/// Draws a reported 1H peak list as a stick spectrum (ppm axis decreasing to the right, as spectra are
/// printed): reconstructed first-order lines, blocks for multiplets and ranges, flagged signals in red with a
/// marker, and the residual solvent and water lines of the declared solvent as dashed labelled lines.
/// </summary>
internal static class StickSpectrumSvg
{
    private const double Width = 620, Height = 230, Left = 20, Right = 600, Base = 190, Top = 40;

    // Observe frequency assumed when the spectrum states none; the caption says so.
    private const double AssumedFrequencyMHz = 400;

    public static string Draw(Spectrum spectrum, IReadOnlySet<int> flagged)
    {
        var frequency = spectrum.FrequencyMHz ?? AssumedFrequencyMHz;
        var signals = spectrum.Signals.Select((s, i) => MultipletLines.Draw(s, i, frequency)).ToList();
        var solventLines = ResidualSolventTable.For(spectrum.Solvent, Nucleus.H1).ToList();
        var (low, high) = Window(signals, solventLines);
        double X(double ppm) => Right - (ppm - low) / (high - low) * (Right - Left);
        var scale = (Base - Top) / Math.Max(1, signals.SelectMany(s => s.Lines).Select(l => l.Intensity).DefaultIfEmpty(1).Max());

        var svg = new StringBuilder();
        svg.Append($"<svg class=\"spectrum\" xmlns=\"http://www.w3.org/2000/svg\" viewBox=\"0 0 {N(Width)} {N(Height)}\" role=\"img\" aria-label=\"1H stick spectrum\">");
        Axis(svg, low, high, X);
        foreach (var line in solventLines) Solvent(svg, line, X);
        foreach (var signal in signals) Signal(svg, signal, flagged.Contains(signal.Index), X, scale);
        var caption = spectrum.FrequencyMHz is null ? $"frequency not stated: drawn at {N(AssumedFrequencyMHz)} MHz" : $"{N(frequency)} MHz";
        svg.Append($"<text class=\"caption\" x=\"{N(Left)}\" y=\"14\">1H, {E(spectrum.Solvent ?? "solvent not stated")}, {E(caption)}</text>");
        return svg.Append("</svg>").ToString();
    }

    private static (double Low, double High) Window(List<DrawnSignal> signals, List<ResidualSolventLine> solvent)
    {
        var positions = signals.SelectMany(s => s.IsBlock ? [s.BlockLowPpm!.Value, s.BlockHighPpm!.Value] : s.Lines.Select(l => l.Ppm))
            .Concat(solvent.Select(l => l.ShiftPpm)).DefaultIfEmpty(0).ToList();
        var low = Math.Floor(Math.Min(0, positions.Min()));
        var high = Math.Ceiling(Math.Max(low + 2, positions.Max() + 0.5));
        return (low, high);
    }

    private static void Axis(StringBuilder svg, double low, double high, Func<double, double> x)
    {
        svg.Append($"<line class=\"axis\" x1=\"{N(Left)}\" y1=\"{N(Base)}\" x2=\"{N(Right)}\" y2=\"{N(Base)}\"/>");
        var step = high - low > 6 ? 1.0 : 0.5;
        for (var ppm = low; ppm <= high + 1e-9; ppm += step)
        {
            svg.Append($"<line class=\"tick\" x1=\"{N(x(ppm))}\" y1=\"{N(Base)}\" x2=\"{N(x(ppm))}\" y2=\"{N(Base + 5)}\"/>");
            svg.Append($"<text class=\"tick-label\" x=\"{N(x(ppm))}\" y=\"{N(Base + 17)}\">{N(ppm)}</text>");
        }

        svg.Append($"<text class=\"tick-label\" x=\"{N(Right)}\" y=\"{N(Base + 32)}\">δ / ppm</text>");
    }

    private static void Solvent(StringBuilder svg, ResidualSolventLine line, Func<double, double> x)
    {
        var label = line.Kind == SolventLineKind.Water ? "H2O" : line.Species;
        svg.Append($"<line class=\"solvent\" x1=\"{N(x(line.ShiftPpm))}\" y1=\"{N(Top - 8)}\" x2=\"{N(x(line.ShiftPpm))}\" y2=\"{N(Base)}\"><title>{E(label)} {Ppm(line.ShiftPpm)} ppm ({E(line.Source.ToString())})</title></line>");
        svg.Append($"<text class=\"solvent-label\" x=\"{N(x(line.ShiftPpm))}\" y=\"{N(Top - 12)}\">{E(label)} {Ppm(line.ShiftPpm)}</text>");
    }

    private static void Signal(StringBuilder svg, DrawnSignal signal, bool isFlagged, Func<double, double> x, double scale)
    {
        var css = isFlagged ? "peak flagged" : "peak";
        svg.Append($"<g class=\"{css}\"><title>signal {signal.Index + 1}</title>");
        if (signal.IsBlock)
        {
            var height = Math.Min(Base - Top, signal.Protons * scale * 0.35);
            var left = x(signal.BlockHighPpm!.Value);
            var width = Math.Max(2, x(signal.BlockLowPpm!.Value) - left);
            svg.Append($"<rect x=\"{N(left)}\" y=\"{N(Base - height)}\" width=\"{N(width)}\" height=\"{N(height)}\"/>");
        }

        foreach (var line in signal.Lines)
        {
            svg.Append($"<line x1=\"{N(x(line.Ppm))}\" y1=\"{N(Base)}\" x2=\"{N(x(line.Ppm))}\" y2=\"{N(Base - line.Intensity * scale)}\"/>");
        }

        if (isFlagged) Marker(svg, signal, x);
        svg.Append("</g>");
    }

    private static void Marker(StringBuilder svg, DrawnSignal signal, Func<double, double> x)
    {
        var ppm = signal.IsBlock ? (signal.BlockLowPpm!.Value + signal.BlockHighPpm!.Value) / 2 : signal.Lines.Average(l => l.Ppm);
        var cx = x(ppm);
        svg.Append($"<path class=\"marker\" d=\"M{N(cx - 5)} {N(Top - 2)} L{N(cx + 5)} {N(Top - 2)} L{N(cx)} {N(Top + 6)} Z\"/>");
    }
}
