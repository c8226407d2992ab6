namespace ConsistencyHost.Spectra.Analysis.Prediction.Coupling;

/// <summary>The first-order coupling tree of one hydrogen class.</summary>
/// <param name="ClassIndex">The hydrogen class.</param>
/// <param name="Links">Its couplings, homonuclear first.</param>
public sealed record CouplingTree(int ClassIndex, IReadOnlyList<CouplingLink> Links)
{
    /// <summary>
    /// Spin-½ partners whose coupling cannot vanish — protons of other classes, and 19F/31P with a coupling that is
    /// always resolved (H–C–F, H ortho to F on an arene): a first-order pattern of this class shows at least these
    /// splittings (unless a proton partner's shift is so close that the pair is second order).
    /// </summary>
    /// <remarks>Computed once: the checks read it for every class of a signal's size, on every signal.</remarks>
    public int ForcedPartners { get; } = Links.Where(IsForced(ClassIndex)).Sum(l => l.Count);

    /// <summary>The links counted in <see cref="ForcedPartners"/>.</summary>
    public IEnumerable<CouplingLink> ForcedLinks => Links.Where(IsForced(ClassIndex));

    private static Func<CouplingLink, bool> IsForced(int self) => l => !l.Range.MayVanish && l.PartnerClass != self;

    /// <summary>Largest |J| any branch allows, Hz (0 for a class with no partners).</summary>
    public double LargestJHz { get; } = Links.Count == 0 ? 0 : Links.Max(l => l.Range.HighHz);

    /// <summary>
    /// The first-order pattern the couplings that cannot vanish give, one letter per branch ("dq"), and the
    /// apparent pattern when all of them are of one type and so may merge into n+1 lines ("quint"); "s" when
    /// none is forced.
    /// </summary>
    public (string FirstOrder, string? Merged) ExpectedPattern()
    {
        var forced = ForcedLinks.ToList();
        if (forced.Count == 0) return ("s", null);
        var letters = string.Concat(forced.OrderByDescending(l => l.Range.HighHz).Select(l => Letters(l.Count + 1)));
        var merged = forced.Count > 1 && forced.Select(l => l.Type).Distinct().Count() == 1 ? Name(forced.Sum(l => l.Count) + 1) : null;
        return (letters, merged);
    }

    private static string Letters(int lines) => lines switch
    {
        2 => "d", 3 => "t", 4 => "q", _ => "(" + Name(lines) + ")",
    };

    private static string Name(int lines) => lines switch
    {
        1 => "s", 2 => "d", 3 => "t", 4 => "q", 5 => "quint", 6 => "sext", 7 => "sept", _ => lines + " lines",
    };
}
