using System.Text;
using ConsistencyHost.Spectra.Model;
using static ConsistencyHost.Cli.Batch.Html.SvgText;

namespace ConsistencyHost.Cli.Batch.Html;

/// <summary>
/// Each reconstructed multiplet enlarged on a Hz scale, because at full width the lines of a 7 Hz quartet at
/// 400 MHz fall within one pixel.
/// </summary>
internal static class MultipletStripSvg
{
    private const double Width = 96, Height = 70, Base = 50, Top = 8;

    public static string Draw(Spectrum spectrum, IReadOnlySet<int> flagged)
    {
        var frequency = spectrum.FrequencyMHz ?? 400;
        var strip = new StringBuilder();
        foreach (var (signal, index) in spectrum.Signals.Select((s, i) => (s, i)))
        {
            var drawn = MultipletLines.Draw(signal, index, frequency);
            if (drawn.Lines.Count < 2) continue;
            strip.Append(One(signal, drawn, frequency, flagged.Contains(index)));
        }

        return strip.Length == 0 ? "" : $"<div class=\"strip\">{strip}</div>";
    }

    private static string One(Signal signal, DrawnSignal drawn, double frequency, bool isFlagged)
    {
        var centre = drawn.Lines.Average(l => l.Ppm);
        var offsets = drawn.Lines.Select(l => ((l.Ppm - centre) * frequency, l.Intensity)).ToList();
        var half = offsets.Max(o => Math.Abs(o.Item1)) + 4;
        var tallest = offsets.Max(o => o.Intensity);
        var svg = new StringBuilder($"<svg class=\"multiplet{(isFlagged ? " flagged" : "")}\" xmlns=\"http://www.w3.org/2000/svg\" viewBox=\"0 0 {N(Width)} {N(Height)}\">");
        svg.Append($"<line class=\"axis\" x1=\"2\" y1=\"{N(Base)}\" x2=\"{N(Width - 2)}\" y2=\"{N(Base)}\"/>");
        foreach (var (hz, intensity) in offsets)
        {
            // Higher shift to the left, as on the full spectrum.
            var x = Width / 2 - hz / half * (Width / 2 - 4);
            svg.Append($"<line class=\"stick\" x1=\"{N(x)}\" y1=\"{N(Base)}\" x2=\"{N(x)}\" y2=\"{N(Base - intensity / tallest * (Base - Top))}\"/>");
        }

        var j = string.Join(", ", signal.Couplings.Select(c => N(c.Hz)));
        svg.Append($"<text class=\"tick-label\" x=\"{N(Width / 2)}\" y=\"{N(Height - 6)}\">{Ppm(centre)} {E(signal.Multiplicity)}{(j.Length > 0 ? $" ({E(j)} Hz)" : "")}</text>");
        return svg.Append("</svg>").ToString();
    }
}
