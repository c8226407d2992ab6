namespace ConsistencyHost.Spectra.Model;

/// <summary>
/// One reported coupling constant. <see cref="CoupledNucleus"/> is null for a homonuclear coupling
/// (H–H in a 1H spectrum) and names the other nucleus ("F", "P", "H", "D") for a typed one such as J(H,F).
/// </summary>
/// <param name="Hz">The coupling constant in hertz (always positive as reported).</param>
/// <param name="PartnerLabel">The partner's label when the report names it (NMReDATA J tags, "J(H2,H3)").</param>
/// <param name="CoupledNucleus">The other nucleus of a heteronuclear or typed coupling; null when H–H or unstated.</param>
public sealed record Coupling(double Hz, string? PartnerLabel = null, string? CoupledNucleus = null)
{
    /// <summary>Number of bonds when the report states it ("2JHF", "³J"); null otherwise.</summary>
    public int? BondCount { get; init; }

    /// <summary>True when the coupling is to a nucleus other than the observed one.</summary>
    public bool IsHeteronuclear => CoupledNucleus is not null && CoupledNucleus != "H";
}
