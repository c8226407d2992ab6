using System.Globalization;
using ConsistencyHost.Sdk.Findings;

namespace ConsistencyHost.Rules.MassFormula.Checks;

/// <summary>
/// Found m/z against calculated m/z, in ppm. The reference is the exact m/z of M's ion when M and the ion
/// are known (so a found value that fits only a wrong calculated value is still caught), otherwise the
/// author's calculated value.
/// </summary>
/// <remarks>Window: ±5 ppm by default, the ACS acceptance window for accurate mass (third-party
/// paraphrase of the ACS guidelines, nmr-data-standards.md §7.3).</remarks>
internal static class FoundWindowCheck
{
    public static IEnumerable<Finding> Check(ClaimContext c)
    {
        if (c.Claim.FoundMz is not { } found)
        {
            yield break;
        }

        var (reference, what) = c.Ion.MoleculeIon is { } ion
            ? (ion.Mz, $"m/z {MassText.Mz(ion.Mz)} of {ion.Hill} from {c.Molecule!.Description}")
            : (c.Claim.CalculatedMz, "the reported calculated value");
        var difference = found - reference;
        var ppm = difference / reference * 1e6;
        var window = c.Options.FoundWindowPpm;
        var withinAbsolute = c.Options.FoundWindowMDa > 0 && Math.Abs(difference * 1000) <= c.Options.FoundWindowMDa;
        if (Math.Abs(ppm) <= window || withinAbsolute)
        {
            yield break;
        }

        yield return c.Locate(new Finding(MassFormulaCodes.FoundOutsideWindow, Severity.Warning,
                string.Create(CultureInfo.InvariantCulture,
                    $"{c.Name}: found {MassText.Reported(found, c.Claim.FoundDecimals)} is {MassText.Ppm(ppm)} ppm ({MassText.MilliDaltons(difference)} mDa) from {what}; the window is ±{window} ppm.")))
            .WithEvidence("expected_mz", MassText.Mz(reference))
            .WithEvidence("found_mz", MassText.Reported(found, c.Claim.FoundDecimals))
            .WithEvidence("difference_ppm", MassText.Ppm(ppm))
            .WithEvidence("difference_mda", MassText.MilliDaltons(difference))
            .WithEvidence("window_ppm", MassText.Plain(window));
    }
}
