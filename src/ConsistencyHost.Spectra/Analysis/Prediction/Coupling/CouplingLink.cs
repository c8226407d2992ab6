namespace ConsistencyHost.Spectra.Analysis.Prediction.Coupling;

/// <summary>One branch of a coupling tree: a set of equivalent partners and the coupling to each.</summary>
/// <param name="PartnerClass">The partner hydrogen class (its index), or -1 for a heteronucleus.</param>
/// <param name="PartnerAtom">For a heteronucleus, the 19F or 31P atom; otherwise -1.</param>
/// <param name="Count">Number of partner nuclei (protons of the class, or 1 for a heteronucleus).</param>
/// <param name="Bonds">Bonds between the coupled nuclei (2 geminal, 3 vicinal, 4 long range).</param>
/// <param name="Type">The coupling type.</param>
/// <param name="Range">Its expected size.</param>
public sealed record CouplingLink(int PartnerClass, int PartnerAtom, int Count, int Bonds, CouplingType Type, JRange Range)
{
    /// <summary>True for a coupling to 19F or 31P.</summary>
    public bool IsHeteronuclear => PartnerClass < 0;

    /// <summary>True when the coupling is to an O–H or N–H, seen only when exchange is slow (dry DMSO-d6).</summary>
    public bool NeedsSlowExchange => Type == CouplingType.VicinalExchangeable;
}
