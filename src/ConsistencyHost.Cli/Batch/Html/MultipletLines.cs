using ConsistencyHost.Spectra.Model;

namespace ConsistencyHost.Cli.Batch.Html;

/// <summary>One line of a reconstructed stick spectrum: position and relative intensity.</summary>
internal readonly record struct StickLine(double Ppm, double Intensity);

/// <summary>How a reported signal is drawn: first-order lines, or a block over a range.</summary>
internal sealed record DrawnSignal(int Index, IReadOnlyList<StickLine> Lines, double? BlockLowPpm, double? BlockHighPpm, double Protons)
{
    public bool IsBlock => BlockLowPpm is not null;
}

/// <summary>
/// Reconstructs the lines of a reported 1H signal from its multiplicity, J values and the observe frequency.
/// </summary>
/// <remarks>
/// First-order (n+1) splitting tree: each coupling to n equivalent spin-1/2 nuclei splits every line into n+1
/// lines J apart with binomial intensities (Pascal's triangle), applied one coupling after another; the total
/// intensity is the signal's proton count. Common practice; e.g. Friebolin, Basic One- and Two-Dimensional NMR
/// Spectroscopy, ch. 4 (from memory). A signal without a multiplicity is drawn as one line. Reported multiplets (m), ranges, second-order labels and patterns whose J
/// count does not fit their letters cannot be reconstructed and are drawn as a block over their range.
/// </remarks>
internal static class MultipletLines
{
    // Half-width of the block drawn for an "m" reported as one shift, ppm. Common practice: unresolved
    // multiplets in small molecules span roughly 0.02–0.1 ppm at 400 MHz.
    private const double UnresolvedHalfWidthPpm = 0.03;

    public static DrawnSignal Draw(Signal signal, int index, double frequencyMHz)
    {
        var protons = signal.ProtonCount ?? 1;
        if (signal.RangeLowPpm is { } low && signal.RangeHighPpm is { } high)
        {
            return new DrawnSignal(index, [], Math.Min(low, high), Math.Max(low, high), protons);
        }

        var centre = signal.CentrePpm;
        var pattern = signal.MultiplicityPattern;
        var splittings = pattern.Components;
        var couplings = signal.Couplings.Where(c => !c.IsHeteronuclear).Select(c => c.Hz).ToList();
        if (pattern.IsSinglet || signal.Multiplicity.Trim().Length == 0)
        {
            return new DrawnSignal(index, [new StickLine(centre, protons)], null, null, protons);
        }

        if (!pattern.IsFirstOrder || couplings.Count != splittings.Count)
        {
            return new DrawnSignal(index, [], centre - UnresolvedHalfWidthPpm, centre + UnresolvedHalfWidthPpm, protons);
        }

        return new DrawnSignal(index, Tree(centre, splittings, couplings, frequencyMHz, protons), null, null, protons);
    }

    /// <summary>Lines of the splitting tree, each splitting with its J in Hz, scaled to <paramref name="total"/>.</summary>
    public static IReadOnlyList<StickLine> Tree(double centrePpm, IReadOnlyList<int> lineCounts, IReadOnlyList<double> jHz, double frequencyMHz, double total)
    {
        IEnumerable<StickLine> lines = [new StickLine(centrePpm, total)];
        for (var k = 0; k < lineCounts.Count; k++)
        {
            var n = lineCounts[k];
            var spacing = jHz[k] / frequencyMHz;
            var weights = Binomial(n - 1);
            lines = lines.SelectMany(line => Enumerable.Range(0, n).Select(i =>
                new StickLine(line.Ppm + (i - (n - 1) / 2.0) * spacing, line.Intensity * weights[i]))).ToList();
        }

        return [.. lines.OrderBy(l => l.Ppm)];
    }

    /// <summary>Row <paramref name="order"/> of Pascal's triangle, normalised to sum 1.</summary>
    public static double[] Binomial(int order)
    {
        var row = new double[order + 1];
        row[0] = 1;
        for (var i = 1; i <= order; i++)
        {
            for (var j = i; j > 0; j--) row[j] += row[j - 1];
        }

        var sum = Math.Pow(2, order);
        return [.. row.Select(v => v / sum)];
    }
}
