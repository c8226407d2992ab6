using System.Globalization;
using ConsistencyHost.Sdk.Findings;
using ConsistencyHost.Spectra.Model;

namespace ConsistencyHost.Rules.CouplingPartners;

/// <summary>
/// Couplings reported with partner labels (NMReDATA J tags, "J(H2,H3)") come in pairs: the J that signal a
/// reports to b must equal the J that b reports to a.
/// </summary>
internal static class LabelledPairs
{
    public static IEnumerable<Finding> Check(Spectrum spectrum, int spectrumIndex, CouplingPartnersOptions options)
    {
        // Most lists name no partners: then there is nothing to pair and no label index to build.
        if (!spectrum.Signals.Any(s => s.Couplings.Any(c => c.PartnerLabel is not null))) yield break;
        var labelOf = LabelIndex(spectrum);
        for (var a = 0; a < spectrum.Signals.Count; a++)
        {
            foreach (var coupling in spectrum.Signals[a].Couplings)
            {
                if (coupling.PartnerLabel is not { } label || !labelOf.TryGetValue(label, out var b) || b <= a) continue;
                var back = spectrum.Signals[b].Couplings.Where(c => c.PartnerLabel is { } l && spectrum.Signals[a].Assignments.Contains(l)).ToList();
                if (back.Count == 0 || back.Any(c => JTolerance.Same(c.Hz, coupling.Hz, options.MinimumToleranceHz))) continue;
                var text = string.Create(CultureInfo.InvariantCulture,
                    $"The coupling between {spectrum.Signals[a].Describe()} and {spectrum.Signals[b].Describe()} is reported as {coupling.Hz} Hz on one side and {back[0].Hz} Hz on the other.");
                yield return new Finding(CouplingPartnersCodes.PartnerJDiffers, Severity.Error, text) { Peaks = [new PeakRef(spectrumIndex, a), new PeakRef(spectrumIndex, b)] }
                    .WithEvidence("j_ab_hz", coupling.Hz).WithEvidence("j_ba_hz", back[0].Hz);
            }
        }
    }

    private static Dictionary<string, int> LabelIndex(Spectrum spectrum)
    {
        var index = new Dictionary<string, int>(StringComparer.Ordinal);
        for (var i = 0; i < spectrum.Signals.Count; i++)
        {
            foreach (var label in spectrum.Signals[i].Assignments) index.TryAdd(label, i);
        }

        return index;
    }
}
