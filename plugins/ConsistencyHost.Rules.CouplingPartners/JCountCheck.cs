using System.Globalization;
using ConsistencyHost.Sdk.Findings;
using ConsistencyHost.Spectra.Model;

namespace ConsistencyHost.Rules.CouplingPartners;

/// <summary>A first-order multiplicity names its splittings; the J list must have one value per letter (dd → 2).</summary>
internal static class JCountCheck
{
    public static IEnumerable<Finding> Check(Spectrum spectrum, int spectrumIndex)
    {
        for (var i = 0; i < spectrum.Signals.Count; i++)
        {
            var signal = spectrum.Signals[i];
            if (signal.Couplings.Count == 0 || signal.MultiplicityPattern.ExpectedCouplingCount() is not { } expected) continue;
            if (signal.Couplings.Count == expected) continue;
            var text = string.Create(CultureInfo.InvariantCulture,
                $"The signal at {signal.Describe()} is a '{signal.Multiplicity}', which has {expected} coupling constant(s), but {signal.Couplings.Count} are reported.");
            yield return new Finding(CouplingPartnersCodes.JCountMismatch, Severity.Warning, text) { Peaks = [new PeakRef(spectrumIndex, i)] }
                .WithEvidence("expected", expected).WithEvidence("observed", signal.Couplings.Count);
        }
    }
}
