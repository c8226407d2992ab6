using ConsistencyHost.Rules.MassFormula.Ions;
using ConsistencyHost.Sdk.Findings;

namespace ConsistencyHost.Rules.MassFormula.Checks;

/// <summary>
/// Judges the author's calculated m/z and the ion formula written with it against the ion of M.
/// The formula and the number are judged separately, so a wrong adduct formula whose mass the author
/// computed correctly gives one finding (the formula), not two.
/// </summary>
internal static class CalculatedMassCheck
{
    public static IEnumerable<Finding> Check(ClaimContext c)
    {
        var formulaWrong = c.Ion.MoleculeIon is { } ion && c.Written is { } written && !WrittenFitsMolecule(c, written, ion);
        if (formulaWrong)
        {
            yield return IonFormulaMismatch(c, c.Written!, c.Ion.MoleculeIon!);
        }

        if (c.Ion.Candidates.Count == 0 || c.Ion.Candidates.Any(i => Fits(c, i.Mz)))
        {
            yield break;
        }

        if (c.Ion.Candidates.FirstOrDefault(i => Fits(c, i.MzWithoutElectron)) is { } omitted)
        {
            yield return ElectronMassOmitted(c, omitted);
        }
        else if (!(formulaWrong && FitsWrittenFormula(c)))
        {
            yield return CalculatedMassMismatch(c, c.Ion.Candidates[0]);
        }
    }

    /// <summary>The written formula is the ion, or (a common way of writing it) M itself.</summary>
    private static bool WrittenFitsMolecule(ClaimContext c, WrittenIonFormula written, Ion ion) =>
        written.Composition.SameCounts(ion.Composition)
        || (c.Ion.Label is { Multiplier: 1 } && written.Composition.SameCounts(c.Molecule!.Composition));

    private static bool Fits(ClaimContext c, double exact) => CalculatedTolerance.Matches(c.Claim.CalculatedMz, exact, c.Tolerance);

    private static bool FitsWrittenFormula(ClaimContext c)
    {
        var ion = c.Written!.AsIon(c.Ion.MoleculeIon!.Charge);
        return Fits(c, ion.Mz) || Fits(c, ion.MzWithoutElectron);
    }

    private static Finding IonFormulaMismatch(ClaimContext c, WrittenIonFormula written, Ion ion)
    {
        var writtenIon = written.AsIon(ion.Charge);
        var fitsWritten = FitsWrittenFormula(c);
        var tail = fitsWritten
            ? $" The calculated value is that of the written formula ({MassText.Mz(writtenIon.Mz)}), not of the structure's ion ({MassText.Mz(ion.Mz)})."
            : Fits(c, ion.Mz) ? " The calculated value itself fits the structure's ion; only the written formula is wrong." : "";
        return c.Locate(new Finding(MassFormulaCodes.IonFormulaMismatch, Severity.Error,
                $"{c.Name}: the ion formula {c.Claim.IonFormula} is not {c.Molecule!.Description} as {c.Ion.Label!.Canonical}, which is {ion.Hill}.{tail}"))
            .WithEvidence("expected_ion_formula", ion.Hill)
            .WithEvidence("reported_ion_formula", c.Claim.IonFormula)
            .WithEvidence("expected_mz", MassText.Mz(ion.Mz))
            .WithEvidence("reported_formula_mz", MassText.Mz(writtenIon.Mz))
            .WithEvidence("reported_mz", MassText.Reported(c.Claim.CalculatedMz, c.Claim.CalculatedDecimals))
            with { Atoms = c.Molecule.AtomsOf(written.Composition.DifferingElements(ion.Composition)) };
    }

    private static Finding ElectronMassOmitted(ClaimContext c, Ion ion) =>
        c.Locate(new Finding(MassFormulaCodes.ElectronMassOmitted, Severity.Warning,
                $"{c.Name}: the calculated value is that of {ion.Hill} ({c.IonSource}) without the electron mass ({MassText.Mz(ion.MzWithoutElectron)}); " +
                $"with it, m/z is {MassText.Mz(ion.Mz)}. An ion's mass is its atoms' masses {(ion.Charge > 0 ? "minus" : "plus")} one electron (0.000549 u) per charge."))
            .WithEvidence("expected_mz", MassText.Mz(ion.Mz))
            .WithEvidence("reported_mz", MassText.Reported(c.Claim.CalculatedMz, c.Claim.CalculatedDecimals))
            .WithEvidence("mz_without_electron", MassText.Mz(ion.MzWithoutElectron))
            .WithEvidence("difference_mda", MassText.MilliDaltons(c.Claim.CalculatedMz - ion.Mz));

    private static Finding CalculatedMassMismatch(ClaimContext c, Ion ion) =>
        c.Locate(new Finding(MassFormulaCodes.CalculatedMassMismatch, Severity.Error,
                $"{c.Name}: m/z of {ion.Hill} ({c.IonSource}) is {MassText.Mz(ion.Mz)}; the reported calculated value differs by " +
                $"{MassText.MilliDaltons(c.Claim.CalculatedMz - ion.Mz)} mDa, more than rounding to {c.Claim.CalculatedDecimals} decimals explains " +
                $"(tolerance {MassText.MilliDaltons(c.Tolerance)} mDa)."))
            .WithEvidence("expected_mz", MassText.Mz(ion.Mz))
            .WithEvidence("reported_mz", MassText.Reported(c.Claim.CalculatedMz, c.Claim.CalculatedDecimals))
            .WithEvidence("expected_ion_formula", ion.Hill)
            .WithEvidence("difference_mda", MassText.MilliDaltons(c.Claim.CalculatedMz - ion.Mz))
            .WithEvidence("difference_ppm", MassText.Ppm((c.Claim.CalculatedMz - ion.Mz) / ion.Mz * 1e6))
            .WithEvidence("tolerance_mda", MassText.MilliDaltons(c.Tolerance));
}
