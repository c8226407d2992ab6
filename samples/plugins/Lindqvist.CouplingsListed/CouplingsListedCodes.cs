namespace Lindqvist.CouplingsListed;

/// <summary>The stable finding codes of the lindqvist-couplings-listed rule.</summary>
public static class CouplingsListedCodes
{
    /// <summary>A split 1H signal lists no coupling constant at all.</summary>
    public const string Missing = "couplings-missing";

    /// <summary>A split 1H signal lists fewer coupling constants than its multiplicity names.</summary>
    public const string Incomplete = "couplings-incomplete";
}
