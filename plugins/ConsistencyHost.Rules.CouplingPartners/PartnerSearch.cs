using System.Globalization;
using ConsistencyHost.Sdk.Findings;
using ConsistencyHost.Spectra.Model;

namespace ConsistencyHost.Rules.CouplingPartners;

/// <summary>
/// Every homonuclear J of at least <see cref="CouplingPartnersOptions.SmallestPartneredJHz"/> needs a partner
/// multiplet with the same J. Searched first among the signals whose classes couple to this one, then —
/// so that an uncertain assignment never causes a false alarm — anywhere in the spectrum.
/// </summary>
internal static class PartnerSearch
{
    public static IEnumerable<Finding> Check(PartnerContext context, CouplingPartnersOptions options)
    {
        var signals = context.Spectrum.Signals;
        foreach (var a in context.CompoundSignals)
        {
            var partners = context.PartnerSignals(a) ?? [.. context.CompoundSignals.Where(s => s != a)];
            foreach (var coupling in signals[a].Couplings)
            {
                if (coupling.IsHeteronuclear || coupling.Hz < options.SmallestPartneredJHz) continue;
                if (HasPartner(context, a, partners, coupling.Hz, options)) continue;
                yield return Unpartnered(context, a, coupling.Hz, options);
            }
        }
    }

    private static bool HasPartner(PartnerContext context, int a, IReadOnlyList<int> partners, double hz, CouplingPartnersOptions options)
    {
        var signals = context.Spectrum.Signals;
        bool Carries(int s)
        {
            var minimum = SharesOneJ(signals[a]) || SharesOneJ(signals[s]) ? Math.Max(options.MinimumToleranceHz, options.EqualCouplingToleranceHz) : options.MinimumToleranceHz;
            return signals[s].Couplings.Any(c => !c.IsHeteronuclear && JTolerance.Same(c.Hz, hz, minimum));
        }
        if (partners.Any(Carries) || partners.Any(s => Unresolved(signals[s]))) return true;
        if (context.CompoundSignals.Where(s => s != a).Any(s => Carries(s) || Unresolved(signals[s]))) return true;

        // A J that no proton partner carries may be to 19F or 31P, or within an AA'XX' multiplet itself.
        return context.MayCoupleToHeteronucleus();
    }

    /// <summary>A pattern with one J for several protons (t, q, quint …): often an average of nearly equal couplings.</summary>
    private static bool SharesOneJ(Signal signal) => signal.MultiplicityPattern.Components.Any(lines => lines >= 3);

    /// <summary>A partner whose J cannot be read: m, broad, apparent, second-order, or given without J.</summary>
    private static bool Unresolved(Signal signal)
    {
        var pattern = signal.MultiplicityPattern;
        return !pattern.IsFirstOrder || pattern.IsBroad || pattern.IsApparent || (signal.Couplings.Count == 0 && !pattern.IsSinglet);
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
