namespace ConsistencyHost.Spectra.Solvents;

/// <summary>
/// How far from a tabulated shift a signal is still taken for that line, ppm, upfield and downfield apart: water
/// moves only one way with its solutes (<see cref="WaterWindowTable"/>), residual and impurity lines by the same
/// small amount either way.
/// </summary>
/// <param name="BelowPpm">How far upfield (lower ppm) of the tabulated value the line may still sit.</param>
/// <param name="AbovePpm">How far downfield (higher ppm) of the tabulated value the line may still sit.</param>
/// <param name="Reason">Why, with the source of each tolerance (published, common practice or from memory).</param>
public sealed record ShiftWindow(double BelowPpm, double AbovePpm, string Reason)
{
    /// <summary>Whether <paramref name="ppm"/> lies in the window around <paramref name="reference"/> (edges included).</summary>
    public bool Contains(double reference, double ppm) => ppm >= reference - BelowPpm - Edge && ppm <= reference + AbovePpm + Edge;

    /// <summary>Whether the range [<paramref name="low"/>, <paramref name="high"/>] overlaps the window around <paramref name="reference"/>.</summary>
    public bool Overlaps(double reference, double low, double high) => high >= reference - BelowPpm - Edge && low <= reference + AbovePpm + Edge;

    // A value exactly on the window edge matches, despite binary rounding.
    private const double Edge = 1e-9;
}
