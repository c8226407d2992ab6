using ConsistencyHost.Chemistry.Model;
using ConsistencyHost.Chemistry.Perception.Symmetry;
using ConsistencyHost.Spectra.Analysis.Interpretation;
using ConsistencyHost.Spectra.Model;

namespace ConsistencyHost.Spectra.Analysis;

/// <summary>
/// The number of signals a structure should give in a given spectrum, as a range with reasons: the
/// structure's stereo-aware range (exchangeable protons may be missing, diastereotopic pairs may coincide,
/// unspecified relative configuration), narrowed in D2O/CD3OD where exchangeable protons never appear, and
/// widened where slow amide rotation can make two N-substituents distinct.
/// </summary>
public static class ExpectedSignals
{
    /// <summary>Expected 1H signals in <paramref name="solvent"/>.</summary>
    public static SignalCountRange Proton(Molecule molecule, NmrEquivalence equivalence, string? solvent)
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

        var split = AmideRotation.Splits(molecule, equivalence).Hydrogen.Count;
        if (split > 0)
        {
            max += split;
            reasons.Add($"slow rotation about an amide C–N bond can make {split} H class(es) of the two N-substituents distinct");
        }

        return new SignalCountRange(Math.Min(min, max), max, reasons);
    }

    /// <summary>Expected 13C lines.</summary>
    public static SignalCountRange Carbon(Molecule molecule, NmrEquivalence equivalence)
    {
        ArgumentNullException.ThrowIfNull(equivalence);
        var range = equivalence.Expected13C;
        var split = AmideRotation.Splits(molecule, equivalence).Carbon.Count;
        return split == 0
            ? range
            : new SignalCountRange(range.Min, range.Max + split,
                [.. range.Reasons, $"slow rotation about an amide C–N bond can make {split} carbon class(es) of the two N-substituents distinct"]);
    }
}
