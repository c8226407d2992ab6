namespace Lindqvist.CouplingsListed;

/// <summary>How many coupling constants a reported first-order multiplicity names.</summary>
/// <remarks>
/// Abbreviations as in the NMReDATA S= attribute (s, d, t, q, …, hept, m, and combinations such as dd and td;
/// Pupier et al., Magn. Reson. Chem. 2018, 56, 703). Each letter of a combination stands for one coupling
/// constant, and quint/sext/sept name one (common practice). Singlets, multiplets and unknown words name
/// none, so they are never reported.
/// </remarks>
internal static class MultipletPattern
{
    /// <summary>The number of J values <paramref name="multiplicity"/> calls for; 0 when it calls for none.</summary>
    public static int CouplingCount(string multiplicity)
    {
        var text = multiplicity.Trim().ToLowerInvariant();
        return text switch
        {
            "quint" or "p" or "pent" or "sext" or "sept" or "hept" => 1,
            "" => 0,
            _ when text.All(c => c is 'd' or 't' or 'q') => text.Length,
            _ => 0,
        };
    }

    /// <summary>The multiplicity without a "br"/"app" qualifier, and whether it was broadened.</summary>
    public static (string Core, bool Broadened) Strip(string multiplicity)
    {
        var text = multiplicity.Trim();
        var broadened = false;
        foreach (var prefix in new[] { "br.", "br", "app.", "app" })
        {
            if (text.StartsWith(prefix + " ", StringComparison.OrdinalIgnoreCase))
            {
                broadened |= prefix.StartsWith("br", StringComparison.Ordinal);
                text = text[(prefix.Length + 1)..].Trim();
            }
        }

        return (text, broadened);
    }
}
