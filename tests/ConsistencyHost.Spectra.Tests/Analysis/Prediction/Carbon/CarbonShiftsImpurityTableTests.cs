using Xunit;
using Xunit.Abstractions;

namespace ConsistencyHost.Spectra.Tests.Analysis.Prediction.Carbon;

/// <summary>
/// The windows against every carbon of the published impurity tables in CDCl3 and DMSO-d6.
/// Source: Gottlieb, Kotlyar, Nudelman, J. Org. Chem. 1997, 62, 7512; Fulmer et al., Organometallics 2010, 29, 2176.
/// </summary>
public sealed class CarbonShiftsImpurityTableTests(ITestOutputHelper output)
{
    [Fact]
    public void Predict_EveryImpurityTableCarbon_LiesInsideItsWindow()
    {
        var cells = ImpurityCarbons.All().ToList();
        var misses = cells.Where(c => !c.Prediction.Window.Contains(c.Ppm))
            .Select(c => $"{c.Impurity} {c.Label} ({c.Solvent}) {c.Ppm} not in [{c.Prediction.Window.Low:0.0}, {c.Prediction.Window.High:0.0}]: {string.Join("; ", c.Prediction.Reasons)}")
            .ToList();

        Assert.True(misses.Count == 0, string.Join(Environment.NewLine, misses));
        Assert.Equal(2, cells.Select(c => c.Solvent).Distinct().Count());
    }

    [Fact]
    public void Predict_ImpurityTableCarbons_MedianWindowAtMostTwelvePpm()
    {
        // Target of the spectrum-model work: median 13C window ≤ 12 ppm over these carbons.
        var cells = ImpurityCarbons.All().ToList();
        var widths = cells.Select(c => c.Prediction.Window.Width).Order().ToList();
        var median = widths.Count % 2 == 1 ? widths[widths.Count / 2] : (widths[widths.Count / 2 - 1] + widths[widths.Count / 2]) / 2;
        var widest = cells.MaxBy(c => c.Prediction.Window.Width)!;
        output.WriteLine($"carbons {cells.Count}, median width {median:0.0} ppm, widest {widest.Prediction.Window.Width:0.0} ppm: " +
            $"{widest.Impurity} {widest.Label} ({widest.Solvent}) — {string.Join("; ", widest.Prediction.Reasons)}");

        Assert.InRange(median, 2.0, 12.0);
    }

    [Fact]
    public void Predict_ImpurityTableCarbons_MostLikelyValueWithinFourPpmForNineInTen()
    {
        // The estimate itself, not only the window: increment methods are good to a few ppm on such small molecules.
        var cells = ImpurityCarbons.All().ToList();
        var close = cells.Count(c => Math.Abs(c.Prediction.Window.MostLikely - c.Ppm) <= 4.0);

        Assert.True(close >= 0.9 * cells.Count, $"{close} of {cells.Count} within 4 ppm");
    }
}
