namespace ConsistencyHost.Cli.Batch.Html;

/// <summary>A label's box on the plot, in SVG user units: left edge, width, and the tier (0 nearest the plot) it sits on.</summary>
internal readonly record struct PlacedLabel(string Text, double AnchorX, double Left, double Width, int Tier);

/// <summary>
/// Places labels over a plot so that no two boxes overlap: each label is centred on its anchor (clamped inside the
/// plot's width) and goes to the lowest tier where it clears every label already there, the labels taken from left to
/// right (greedy interval scheduling: with the labels sorted by position, first fit never needs more tiers than the
/// largest number of labels whose boxes share one point).
/// </summary>
/// <remarks>
/// Widths are estimated, not measured (the page is written without a browser): <see cref="CharWidth"/> is a generous
/// 10 px sans-serif advance (digits are about 5.6 px in common UI fonts, capitals up to about 7 px); the browser test
/// checks that every label's text fits its box.
/// </remarks>
internal static class LabelTiers
{
    public const double CharWidth = 6.4;
    public const double Padding = 3;
    public const double Gap = 4;

    public static IReadOnlyList<PlacedLabel> Place(IEnumerable<(string Text, double X)> labels, double minX, double maxX)
    {
        var tierEnds = new List<double>();
        var placed = new List<PlacedLabel>();
        foreach (var (text, x) in labels.OrderBy(l => l.X))
        {
            var width = text.Length * CharWidth + 2 * Padding;
            var left = Math.Clamp(x - width / 2, minX, Math.Max(minX, maxX - width));
            var tier = tierEnds.FindIndex(end => end + Gap <= left);
            if (tier < 0)
            {
                tier = tierEnds.Count;
                tierEnds.Add(0);
            }

            tierEnds[tier] = left + width;
            placed.Add(new PlacedLabel(text, x, left, width, tier));
        }

        return placed;
    }
}
