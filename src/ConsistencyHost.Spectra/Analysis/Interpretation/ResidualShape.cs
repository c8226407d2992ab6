using ConsistencyHost.Spectra.Model;
using ConsistencyHost.Spectra.Solvents;

namespace ConsistencyHost.Spectra.Analysis.Interpretation;

/// <summary>
/// Whether a reported signal looks like the line it sits on: a shift match alone is not enough, since the
/// compound has signals everywhere. Water is a singlet, often broad; a residual protio-solvent line is a
/// singlet or a small H–D multiplet (²J(H,D) ≈ 2 Hz); an impurity group has its tabulated multiplicity and J.
/// </summary>
/// <remarks>Multiplicities and J from Gottlieb et al. 1997 and Fulmer et al. 2010 (via the solvent tables);
/// the H–D coupling size is common practice (J(H,D) ≈ J(H,H)/6.5).</remarks>
internal static class ResidualShape
{
    private const double LargestHydrogenDeuteriumCouplingHz = 3.0;
    private const double ImpurityJToleranceHz = 1.0;

    public static bool Fits(Signal signal, ResidualMatch match)
    {
        var pattern = signal.MultiplicityPattern;
        return match.Kind switch
        {
            ResidualMatchKind.Water => IsSingletLike(signal, pattern),
            ResidualMatchKind.ResidualSolvent => IsSingletLike(signal, pattern) || signal.Couplings.All(c => c.Hz <= LargestHydrogenDeuteriumCouplingHz),
            _ => FitsImpurityGroup(signal, pattern, match),
        };
    }

    private static bool IsSingletLike(Signal signal, Multiplicity pattern) =>
        signal.Couplings.Count == 0 && (signal.Multiplicity.Length == 0 || pattern.IsSinglet || pattern.IsBroad);

    private static bool FitsImpurityGroup(Signal signal, Multiplicity pattern, ResidualMatch match)
    {
        var group = ImpurityTable.All.FirstOrDefault(i => i.Name == match.Name)?.Groups.FirstOrDefault(g => g.Label == match.Group);
        if (group is null || signal.Multiplicity.Length == 0 || group.Exchangeable) return signal.Couplings.Count == 0 || group is null;
        var tabulated = Multiplicity.Parse(group.Multiplicity);
        if (tabulated.IsMultiplet || pattern.IsMultiplet) return true;
        if (!pattern.Components.SequenceEqual(tabulated.Components) || pattern.IsSinglet != tabulated.IsSinglet) return false;
        return group.JHz is not { } j || signal.Couplings.All(c => Math.Abs(c.Hz - j) <= ImpurityJToleranceHz);
    }
}
