using ConsistencyHost.Chemistry.Perception.Symmetry;
using ConsistencyHost.Spectra.Model;

namespace ConsistencyHost.Spectra.Analysis;

/// <summary>
/// The number of signals a structure should give in a given spectrum, as a range with reasons: the
/// structure's stereo-aware range (exchangeable protons may be missing, diastereotopic pairs may coincide,
/// unspecified relative configuration, slow amide rotation), narrowed in D2O/CD3OD where exchangeable
/// protons never appear.
/// </summary>
public static class ExpectedSignals
{
    /// <summary>Expected 1H signals in <paramref name="solvent"/>.</summary>
    public static SignalCountRange Proton(NmrEquivalence equivalence, string? solvent)
    {
        ArgumentNullException.ThrowIfNull(equivalence);
        var range = equivalence.Expected1H;
        var (min, max, reasons) = (range.Min, range.Max, range.Reasons.ToList());
        if (LabileExchange.RemovesExchangeableProtons(solvent))
        {
            var exchangeable = equivalence.HydrogenClasses.Count(c => c.IsExchangeable);
            if (exchangeable > 0)
            {
                max -= exchangeable;
                reasons.Add($"{exchangeable} exchangeable H class(es) are replaced by deuterium in {SolventNames.Normalise(solvent)}");
            }
        }

        return new SignalCountRange(Math.Min(min, max), max, reasons);
    }

    /// <summary>Expected 13C lines (the structure's range; no solvent dependence).</summary>
    public static SignalCountRange Carbon(NmrEquivalence equivalence)
    {
        ArgumentNullException.ThrowIfNull(equivalence);
        return equivalence.Expected13C;
    }
}
