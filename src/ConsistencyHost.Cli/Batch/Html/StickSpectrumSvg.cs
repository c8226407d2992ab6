using System.Text;
using ConsistencyHost.Spectra.Model;
using ConsistencyHost.Spectra.Solvents;
using static ConsistencyHost.Cli.Batch.Html.SvgText;

namespace ConsistencyHost.Cli.Batch.Html;

/// <summary>
/// Draws a reported 1H peak list as a stick spectrum (ppm axis decreasing to the right, as spectra are
/// printed): reconstructed first-order lines, blocks for multiplets and ranges, flagged signals in red with a
/// marker, and the residual solvent and water lines of the declared solvent as dashed labelled lines. The labels sit
/// on tiers above the plot (<see cref="LabelTiers"/>) so that none overlaps another, however close the lines; each
/// extra tier moves the plot down by one <see cref="TierHeight"/>.
/// </summary>
internal static class StickSpectrumSvg
{
    private const double Width = 620, Left = 20, Right = 600, PlotHeight = 150, FirstTop = 40, TierHeight = 13, LabelHeight = 12;

    // Observe frequency assumed when the spectrum states none; the caption says so.
    private const double AssumedFrequencyMHz = 400;

    public static string Draw(Spectrum spectrum, IReadOnlySet<int> flagged)
    {
        var frequency = spectrum.FrequencyMHz ?? AssumedFrequencyMHz;
        var signals = spectrum.Signals.Select((s, i) => MultipletLines.Draw(s, i, frequency)).ToList();
        var solventLines = ResidualSolventTable.For(spectrum.Solvent, Nucleus.H1).ToList();
        var (low, high) = Window(signals, solventLines);
        double X(double ppm) => Right - (ppm - low) / (high - low) * (Right - Left);
        // Left to right, as LabelTiers places them, so that labels[i] belongs to solventLines[i].
        solventLines = [.. solventLines.OrderBy(l => X(l.ShiftPpm))];
        var labels = LabelTiers.Place(solventLines.Select(l => (Label(l), X(l.ShiftPpm))), 0, Width);
        var frame = new Frame(FirstTop + TierHeight * Math.Max(0, labels.Select(l => l.Tier).DefaultIfEmpty(0).Max()));
        var scale = (frame.Base - frame.Top) / Math.Max(1, signals.SelectMany(s => s.Lines).Select(l => l.Intensity).DefaultIfEmpty(1).Max());

        var svg = new StringBuilder();
        svg.Append($"<svg class=\"spectrum\" xmlns=\"http://www.w3.org/2000/svg\" viewBox=\"0 0 {N(Width)} {N(frame.Height)}\" role=\"img\" aria-label=\"1H stick spectrum\">");
        Axis(svg, frame, low, high, X);
        // Every dashed line before any label: a line that runs past a lower tier's label passes behind its white box.
        for (var i = 0; i < solventLines.Count; i++) SolventLine(svg, frame, solventLines[i], labels[i]);
        foreach (var label in labels) SolventLabel(svg, frame, label);
        foreach (var signal in signals) Signal(svg, frame, signal, flagged.Contains(signal.Index), X, scale);
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

    /// <summary>The plot's vertical layout: the top of the sticks, the baseline, the whole height.</summary>
    private readonly record struct Frame(double Top)
    {
        public double Base => Top + PlotHeight;

        public double Height => Base + 40;

        /// <summary>Baseline of a label's text on <paramref name="tier"/> (0 just above the plot).</summary>
        public double LabelBaseline(int tier) => Top - 12 - tier * TierHeight;
    }

    private static string Label(ResidualSolventLine line) =>
        $"{(line.Kind == SolventLineKind.Water ? "H2O" : line.Species)} {Ppm(line.ShiftPpm)}";

    private static void Axis(StringBuilder svg, Frame frame, double low, double high, Func<double, double> x)
    {
        var baseline = frame.Base;
        svg.Append($"<line class=\"axis\" x1=\"{N(Left)}\" y1=\"{N(baseline)}\" x2=\"{N(Right)}\" y2=\"{N(baseline)}\"/>");
        var step = high - low > 6 ? 1.0 : 0.5;
        for (var ppm = low; ppm <= high + 1e-9; ppm += step)
        {
            svg.Append($"<line class=\"tick\" x1=\"{N(x(ppm))}\" y1=\"{N(baseline)}\" x2=\"{N(x(ppm))}\" y2=\"{N(baseline + 5)}\"/>");
            svg.Append($"<text class=\"tick-label\" x=\"{N(x(ppm))}\" y=\"{N(baseline + 17)}\">{N(ppm)}</text>");
        }

        svg.Append($"<text class=\"tick-label\" x=\"{N(Right)}\" y=\"{N(baseline + 32)}\">δ / ppm</text>");
    }

    // The dashed line reaches up to its own label; the label is drawn on a white box so that lines passing behind it
    // (a lower tier's dashed line) do not cross its text.
    private static void SolventLine(StringBuilder svg, Frame frame, ResidualSolventLine line, PlacedLabel label) =>
        svg.Append($"<line class=\"solvent\" x1=\"{N(label.AnchorX)}\" y1=\"{N(frame.LabelBaseline(label.Tier) + 3)}\" x2=\"{N(label.AnchorX)}\" y2=\"{N(frame.Base)}\"><title>{E(label.Text)} ppm ({E(line.Source.ToString())})</title></line>");

    private static void SolventLabel(StringBuilder svg, Frame frame, PlacedLabel label)
    {
        var baseline = frame.LabelBaseline(label.Tier);
        svg.Append($"<g class=\"solvent-label\"><rect class=\"label-box\" x=\"{N(label.Left)}\" y=\"{N(baseline - LabelHeight + 3)}\" width=\"{N(label.Width)}\" height=\"{N(LabelHeight)}\"/>");
        svg.Append($"<text x=\"{N(label.Left + label.Width / 2)}\" y=\"{N(baseline)}\">{E(label.Text)}</text></g>");
    }

    private static void Signal(StringBuilder svg, Frame frame, DrawnSignal signal, bool isFlagged, Func<double, double> x, double scale)
    {
        var (top, baseline) = (frame.Top, frame.Base);
        var css = isFlagged ? "peak flagged" : "peak";
        svg.Append($"<g class=\"{css}\"><title>signal {signal.Index + 1}</title>");
        if (signal.IsBlock)
        {
            var height = Math.Min(baseline - top, signal.Protons * scale * 0.35);
            var left = x(signal.BlockHighPpm!.Value);
            var width = Math.Max(2, x(signal.BlockLowPpm!.Value) - left);
            svg.Append($"<rect x=\"{N(left)}\" y=\"{N(baseline - height)}\" width=\"{N(width)}\" height=\"{N(height)}\"/>");
        }

        foreach (var line in signal.Lines)
        {
            svg.Append($"<line x1=\"{N(x(line.Ppm))}\" y1=\"{N(baseline)}\" x2=\"{N(x(line.Ppm))}\" y2=\"{N(baseline - line.Intensity * scale)}\"/>");
        }

        if (isFlagged) Marker(svg, frame.Top, signal, x);
        svg.Append("</g>");
    }

    private static void Marker(StringBuilder svg, double top, DrawnSignal signal, Func<double, double> x)
    {
        var ppm = signal.IsBlock ? (signal.BlockLowPpm!.Value + signal.BlockHighPpm!.Value) / 2 : signal.Lines.Average(l => l.Ppm);
        var cx = x(ppm);
        svg.Append($"<path class=\"marker\" d=\"M{N(cx - 5)} {N(top - 2)} L{N(cx + 5)} {N(top - 2)} L{N(cx)} {N(top + 6)} Z\"/>");
    }
}
