namespace ConsistencyHost.Rules.CouplingPartners;

/// <summary>The stable finding codes of the coupling-partners rule.</summary>
public static class CouplingPartnersCodes
{
    /// <summary>A reported J that no partner multiplet carries.</summary>
    public const string JWithoutPartner = "j-without-partner";

    /// <summary>A labelled pair J(a,b) and J(b,a) reported with different values.</summary>
    public const string PartnerJDiffers = "partner-j-differs";

    /// <summary>The number of J values does not match the multiplicity letters (dd with one J).</summary>
    public const string JCountMismatch = "j-count-mismatch";

    /// <summary>A first-order multiplicity that no assignment of the structure's protons allows.</summary>
    public const string MultiplicityImpossible = "multiplicity-impossible";

    /// <summary>A reported range narrower or wider than the first-order multiplet it describes.</summary>
    public const string RangeWidthMismatch = "range-width-mismatch";

    /// <summary>A first-order pattern with fewer splittings than the couplings of its protons that cannot vanish give (ethyl CH2 as a t).</summary>
    public const string PatternTooFewLines = "pattern-too-few-lines";

    /// <summary>A J larger than any coupling type the structure offers the signal's protons (16 Hz on a cis alkene).</summary>
    public const string JOutsideCouplingTypes = "j-outside-coupling-types";
}
