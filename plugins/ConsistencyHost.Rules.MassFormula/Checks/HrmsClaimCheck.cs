using ConsistencyHost.Sdk.Findings;
using ConsistencyHost.Spectra.Model;

namespace ConsistencyHost.Rules.MassFormula.Checks;

/// <summary>All checks of one HRMS claim: its written ion formula, its ion, its calculated and found values.</summary>
internal static class HrmsClaimCheck
{
    public static IEnumerable<Finding> Check(HrmsClaim claim, int index, MoleculeReference? molecule, MassFormulaOptions options)
    {
        var (written, unreadable) = WrittenIonFormula.Read(claim.IonFormula);
        var tolerance = CalculatedTolerance.For(claim.CalculatedDecimals, options);
        var ion = IonResolver.Resolve(claim, written, molecule, tolerance);
        var context = new ClaimContext(claim, index, written, ion, molecule, tolerance, options);
        if (unreadable is not null)
        {
            yield return context.Locate(new Finding(MassFormulaCodes.IonFormulaUnreadable, Severity.Warning,
                    $"{context.Name}: the ion formula '{claim.IonFormula}' cannot be read ({unreadable}); only the m/z values are checked."))
                .WithEvidence("reported_ion_formula", claim.IonFormula);
        }

        if (ion.Problem is not null)
        {
            yield return context.Locate(new Finding(MassFormulaCodes.IonNotRecognised, Severity.Info,
                $"{context.Name}: the ion is not recognised ({ion.Problem}); the calculated value is not checked."));
        }

        foreach (var finding in CalculatedMassCheck.Check(context).Concat(FoundWindowCheck.Check(context)))
        {
            yield return finding;
        }
    }
}
