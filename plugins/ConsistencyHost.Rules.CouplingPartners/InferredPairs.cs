using System.Globalization;
using ConsistencyHost.Sdk.Findings;
using ConsistencyHost.Spectra.Model;

namespace ConsistencyHost.Rules.CouplingPartners;

/// <summary>
/// Two unpartnered J values that can only be the same coupling: in the best assignment each signal holds one
/// hydrogen class whose coupling tree has the other's class as its only partner that does not vanish, and both
/// values lie in that coupling type's range. One mismatch between two signals is then one finding naming both
/// (the author typed 7.2 Hz on one side and 6.8 Hz on the other), not two "no partner" warnings.
/// </summary>
internal static class InferredPairs
{
    /// <summary>Allowance beyond the coupling type's tabulated range, Hz (rounding; common practice).</summary>
    private const double RangeSlackHz = 0.5;

    /// <summary>The unpartnered couplings that pair up, each pair once as (a, J at a, b, J at b).</summary>
    public static List<(int A, double HzA, int B, double HzB)> Find(PartnerContext context, IReadOnlyList<(int Signal, double Hz)> unpartnered)
    {
        var pairs = new List<(int, double, int, double)>();
        if (unpartnered.Count < 2) return pairs;
        var classOf = new Dictionary<int, int>();
        foreach (var (signal, _, cls) in TreeSignals.Of(context)) classOf[signal] = cls;
        var used = new HashSet<int>();
        for (var i = 0; i < unpartnered.Count; i++)
        {
            for (var j = i + 1; j < unpartnered.Count; j++)
            {
                var (a, hzA) = unpartnered[i];
                var (b, hzB) = unpartnered[j];
                if (a == b || used.Contains(i) || used.Contains(j)) continue;
                if (!classOf.TryGetValue(a, out var ca) || !classOf.TryGetValue(b, out var cb)) continue;
                if (!OnlyPartner(context, ca, cb, hzA, hzB) || !OnlyPartner(context, cb, ca, hzB, hzA)) continue;
                pairs.Add((a, hzA, b, hzB));
                used.Add(i);
                used.Add(j);
            }
        }

        return pairs;
    }

    public static Finding Finding(PartnerContext context, (int A, double HzA, int B, double HzB) pair)
    {
        var signals = context.Spectrum.Signals;
        var text = string.Create(CultureInfo.InvariantCulture,
            $"The signals at {signals[pair.A].Describe()} and {signals[pair.B].Describe()} can only couple to each other, but report J = {pair.HzA} Hz and J = {pair.HzB} Hz.");
        return new Finding(CouplingPartnersCodes.PartnerJDiffers, Severity.Warning, text)
            {
                Peaks = [new PeakRef(context.SpectrumIndex, pair.A), new PeakRef(context.SpectrumIndex, pair.B)],
            }
            .WithEvidence("j_ab_hz", pair.HzA).WithEvidence("j_ba_hz", pair.HzB);
    }

    /// <summary>True when the only non-vanishing H–H coupling of class <paramref name="own"/> is to <paramref name="other"/>, of a size that holds both values.</summary>
    private static bool OnlyPartner(PartnerContext context, int own, int other, double hz, double otherHz)
    {
        var links = context.Trees![own].Links;
        var found = false;
        foreach (var link in links)
        {
            if (link.IsHeteronuclear || link.PartnerClass == own || link.Range.MayVanish) continue;
            if (link.PartnerClass != other) return false;
            found = link.Range.Contains(hz, RangeSlackHz) && link.Range.Contains(otherHz, RangeSlackHz);
        }

        return found;
    }
}
