namespace ConsistencyHost.Rules.MassFormula.Checks;

/// <summary>How far an author's calculated m/z may be from ours and still be a correct rounding.</summary>
/// <remarks>
/// Half a unit of the last decimal written (a correctly rounded value is never further off), plus 5 µu for
/// the spread between mass tables and adduct constants (a common calculator's Na+ differs from the
/// atomic-mass value by 2.7 µu; nmr-data-standards.md §7.3), and never below the profile's floor
/// (default 0.1 mDa). With 3 decimals or fewer the tolerance (≥ 0.505 mDa) nearly equals the electron mass
/// (0.549 mDa), so an omitted electron cannot be told from rounding and is not reported.
/// </remarks>
internal static class CalculatedTolerance
{
    /// <summary>Spread between mass tables and calculator constants, u.</summary>
    public const double TableSpread = 0.000005;

    /// <summary>The tolerance, u, for a value written with <paramref name="decimals"/> decimals.</summary>
    public static double For(int decimals, MassFormulaOptions options)
    {
        var halfUnit = 0.5 * Math.Pow(10, -Math.Clamp(decimals, 0, 12));
        return Math.Max(halfUnit + TableSpread, options.MinimumCalculatedToleranceMDa / 1000);
    }

    /// <summary>True when <paramref name="reported"/> is <paramref name="exact"/> within the tolerance.</summary>
    public static bool Matches(double reported, double exact, double tolerance) => Math.Abs(reported - exact) <= tolerance;
}
