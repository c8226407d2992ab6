using ConsistencyHost.Spectra.Model;

namespace ConsistencyHost.Spectra.Analysis.Assignment;

/// <summary>What a reported multiplicity says about the number of coupled protons.</summary>
public static class PatternReading
{
    /// <summary>
    /// The protons (or spin-½ nuclei) a first-order pattern implies: the sum over its splittings of lines − 1
    /// (d → 1, t → 2, dd → 2, dq → 4, s → 0). Null when the pattern constrains nothing: m, second-order labels,
    /// broad or apparent patterns (br and app signal that the n+1 reading is not to be trusted; common
    /// practice), or no multiplicity at all.
    /// </summary>
    public static int? ImpliedCoupledProtons(Multiplicity pattern)
    {
        if (!pattern.IsFirstOrder || pattern.IsBroad || pattern.IsApparent)
        {
            return null;
        }

        var sum = 0;
        foreach (var lines in pattern.Components) sum += lines - 1;
        return sum;
    }
}
