using ConsistencyHost.Sdk.Entries;
using ConsistencyHost.Sdk.Findings;
using ConsistencyHost.Sdk.Rules;
using ConsistencyHost.Spectra.Model;

namespace ConsistencyHost.Rules.CouplingPartners;

/// <summary>
/// Coupling constants and multiplicities hang together: every J has a partner multiplet with the same J;
/// labelled partners agree; the number of J values fits the letters; the pattern fits the structure's
/// neighbours; a reported range fits the multiplet's width. Partners reported as m, br, app or second-order
/// patterns, and couplings to 19F/31P, are not held against a J.
/// </summary>
[Rule("coupling-partners", "1.0.0", "Every coupling constant has its partner and fits the multiplicity", Nuclei = ["1H"])]
public sealed class CouplingPartnersRule : Rule<CouplingPartnersOptions>
{
    /// <inheritdoc />
    protected override IEnumerable<Finding> Check(IEntryView entry, CouplingPartnersOptions options, CancellationToken cancellationToken)
    {
        for (var i = 0; i < entry.Spectra.Count; i++)
        {
            cancellationToken.ThrowIfCancellationRequested();
            var spectrum = entry.Spectra[i];
            foreach (var finding in JCountCheck.Check(spectrum, i)) yield return finding;
            if (spectrum.Nucleus != Nucleus.H1) continue;
            var context = PartnerContext.Create(entry, i);
            foreach (var finding in PartnerSearch.Check(context, options)) yield return finding;
            foreach (var finding in LabelledPairs.Check(spectrum, i, options)) yield return finding;
            foreach (var finding in PatternFeasibility.Check(context)) yield return finding;
            foreach (var finding in TreePatternCheck.Check(context)) yield return finding;
            foreach (var finding in TreeJCheck.Check(context)) yield return finding;
            foreach (var finding in RangeWidthCheck.Check(spectrum, i, options)) yield return finding;
        }
    }
}
