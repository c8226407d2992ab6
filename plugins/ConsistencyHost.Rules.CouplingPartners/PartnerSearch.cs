using System.Globalization;
using ConsistencyHost.Sdk.Findings;
using ConsistencyHost.Spectra.Model;

namespace ConsistencyHost.Rules.CouplingPartners;

/// <summary>
/// Every homonuclear J of at least <see cref="CouplingPartnersOptions.SmallestPartneredJHz"/> needs a partner
/// multiplet with the same J. Any other compound signal may be the partner, not only those whose classes the
/// assignment says couple to this one, so that an uncertain assignment never causes a false alarm.
/// </summary>
internal static class PartnerSearch
{
    public static IEnumerable<Finding> Check(PartnerContext context, CouplingPartnersOptions options)
    {
        var signals = context.Spectrum.Signals;
        var unpartnered = new List<(int Signal, double Hz)>();
        foreach (var a in context.CompoundSignals)
        {
            foreach (var coupling in signals[a].Couplings)
            {
                if (coupling.IsHeteronuclear || coupling.Hz < options.SmallestPartneredJHz) continue;
                if (HasPartner(context, a, coupling.Hz, options)) continue;
                unpartnered.Add((a, coupling.Hz));
            }
        }

        // Two unpartnered J that can only be one coupling are one mismatch between two signals.
        var pairs = InferredPairs.Find(context, unpartnered);
        foreach (var pair in pairs) yield return InferredPairs.Finding(context, pair);
        foreach (var (a, hz) in unpartnered)
        {
            if (pairs.Exists(p => (p.A == a && p.HzA == hz) || (p.B == a && p.HzB == hz))) continue;
            yield return Unpartnered(context, a, hz, options);
        }
    }

    private static bool HasPartner(PartnerContext context, int a, double hz, CouplingPartnersOptions options)
    {
        var facts = context.Facts;
        var unit = JTolerance.Unit(hz);
        var wide = Math.Max(options.MinimumToleranceHz, options.EqualCouplingToleranceHz);
        foreach (var s in context.CompoundSignals)
        {
            if (s == a) continue;
            if (facts[s].Unresolved) return true;
            var minimum = facts[a].SharesOneJ || facts[s].SharesOneJ ? wide : options.MinimumToleranceHz;
            if (facts[s].Carries(hz, unit, minimum)) return true;
        }

        // A J that no proton partner carries may be to 19F or 31P, or within an AA'XX' multiplet itself.
        return context.MayCoupleToHeteronucleus();
    }

    private static Finding Unpartnered(PartnerContext context, int a, double hz, CouplingPartnersOptions options)
    {
        var signal = context.Spectrum.Signals[a];
        var tolerance = JTolerance.Between(hz, hz, options.MinimumToleranceHz);
        var text = string.Create(CultureInfo.InvariantCulture,
            $"The signal at {signal.Describe()} reports J = {hz} Hz, but no other multiplet carries a coupling of {hz} ± {tolerance:0.0#} Hz.");
        return new Finding(CouplingPartnersCodes.JWithoutPartner, Severity.Warning, text) { Peaks = [new PeakRef(context.SpectrumIndex, a)] }
            .WithEvidence("j_hz", hz).WithEvidence("tolerance_hz", tolerance);
    }
}
