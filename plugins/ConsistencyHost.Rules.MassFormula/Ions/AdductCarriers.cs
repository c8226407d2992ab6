using System.Collections.Frozen;

namespace ConsistencyHost.Rules.MassFormula.Ions;

/// <summary>
/// The groups of an ion label that carry a charge in electrospray and related soft ionisation: cations
/// that attach (H+, alkali metals, Ag+, NH4+) and anions that attach (halide, formate, acetate,
/// trifluoroacetate). Any other group in a label ("−H2O", "+CH3CN") is a neutral gain or loss.
/// </summary>
/// <remarks>
/// Common practice; the set follows the usual ESI adduct lists (from memory of the Fiehn-lab MS adduct
/// calculator cited in nmr-data-standards.md §7.3). Keys are Hill formulae of the group without charge.
/// </remarks>
internal static class AdductCarriers
{
    private static readonly FrozenDictionary<string, int> ChargeByHill = new Dictionary<string, int>(StringComparer.Ordinal)
    {
        ["H"] = 1,
        ["Li"] = 1,
        ["Na"] = 1,
        ["K"] = 1,
        ["Rb"] = 1,
        ["Cs"] = 1,
        ["Ag"] = 1,
        ["H4N"] = 1, // NH4+
        ["Cl"] = -1,
        ["Br"] = -1,
        ["I"] = -1,
        ["CHO2"] = -1, // formate HCOO−
        ["C2H3O2"] = -1, // acetate CH3COO−
        ["C2F3O2"] = -1, // trifluoroacetate CF3COO−
    }.ToFrozenDictionary(StringComparer.Ordinal);

    /// <summary>The charge the group carries when it attaches; 0 for a neutral gain or loss.</summary>
    public static int ChargeOf(string hillWithoutCharge) => ChargeByHill.GetValueOrDefault(hillWithoutCharge);
}
