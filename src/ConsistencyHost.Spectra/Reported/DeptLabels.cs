namespace ConsistencyHost.Spectra.Reported;

/// <summary>
/// Carbon multiplicity labels from edited 13C spectra (DEPT, APT): "(C)", "(Cq)", "(CH)", "(CH2)", "(CH3)", and a
/// carbon count written with them: "(2×CH)", "(2 x CH)", "(CH × 2)" are two carbons.
/// </summary>
/// <remarks>Common practice in 13C lists of experimental sections (the label names the number of attached H found by
/// the DEPT/APT experiment).</remarks>
internal static class DeptLabels
{
    private static readonly HashSet<string> Kinds = new(StringComparer.Ordinal)
    {
        "C", "Cq", "Cq.", "CH", "CH2", "CH3", "CH₂", "CH₃", "quat", "quat.", "Cquat", "Cquat.", "q-C", "Cquart",
    };

    /// <summary>True when <paramref name="text"/> is such a label; <paramref name="carbons"/> is the count written (1 when none).</summary>
    public static bool TryRead(string text, out int carbons)
    {
        carbons = 1;
        if (Kinds.Contains(text)) return true;
        if ((Multiplier.TrySplitLeading(text, out var n, out var rest) || Multiplier.TrySplitTrailing(text, out n, out rest))
            && n >= 1 && Kinds.Contains(rest))
        {
            carbons = n;
            return true;
        }
        return false;
    }
}
