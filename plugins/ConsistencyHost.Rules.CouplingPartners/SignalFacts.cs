using ConsistencyHost.Spectra.Model;

namespace ConsistencyHost.Rules.CouplingPartners;

/// <summary>
/// What the partner search asks of one signal, worked out once: every J of every signal is compared with the
/// couplings of every other signal, so reading the multiplicity and the J values' precision per comparison
/// cost more than the comparisons.
/// </summary>
/// <param name="SharesOneJ">A pattern with one J for several protons (t, q, quint …): often an average of nearly equal couplings.</param>
/// <param name="Unresolved">A signal whose J cannot be read: m, broad, apparent, second-order, or given without J.</param>
/// <param name="HomonuclearJ">The signal's H–H (untyped) J values, in reported order.</param>
/// <param name="Units">One unit of the last decimal each of <paramref name="HomonuclearJ"/> was written with.</param>
internal sealed record SignalFacts(bool SharesOneJ, bool Unresolved, double[] HomonuclearJ, double[] Units)
{
    public static SignalFacts Of(Signal signal)
    {
        var pattern = signal.MultiplicityPattern;
        var sharesOneJ = false;
        foreach (var lines in pattern.Components) sharesOneJ |= lines >= 3;
        var unresolved = !pattern.IsFirstOrder || pattern.IsBroad || pattern.IsApparent || (signal.Couplings.Count == 0 && !pattern.IsSinglet);
        var homonuclear = signal.Couplings.Where(c => !c.IsHeteronuclear).Select(c => c.Hz).ToArray();
        return new SignalFacts(sharesOneJ, unresolved, homonuclear, [.. homonuclear.Select(JTolerance.Unit)]);
    }

    /// <summary>True when one of this signal's H–H couplings is the same as <paramref name="hz"/> (whose unit is given).</summary>
    public bool Carries(double hz, double hzUnit, double minimum)
    {
        for (var i = 0; i < HomonuclearJ.Length; i++)
        {
            if (JTolerance.Same(HomonuclearJ[i], Units[i], hz, hzUnit, minimum)) return true;
        }

        return false;
    }
}
