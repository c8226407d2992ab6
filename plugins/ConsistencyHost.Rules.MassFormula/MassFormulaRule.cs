using ConsistencyHost.Rules.MassFormula.Checks;
using ConsistencyHost.Sdk.Entries;
using ConsistencyHost.Sdk.Findings;
using ConsistencyHost.Sdk.Rules;

namespace ConsistencyHost.Rules.MassFormula;

/// <summary>
/// The stated molecular formula is the structure's; each HRMS calculated m/z is that of the structure's
/// formula as the stated ion, electron mass included; each found m/z is within the profile's ppm window.
/// </summary>
/// <remarks>
/// Masses: NIST nuclide masses and the CODATA electron mass through the chemistry library; the HRMS
/// convention m/z = (Σ atom masses − z·mₑ)/|z| (nmr-data-standards.md §7.1–7.3). Without a structure, M is
/// the stated formula; without either, only the written ion formula and the found value are checked.
/// </remarks>
[Rule("mass-formula", "1.0.0", "HRMS calculated and found m/z and the stated formula agree with the structure")]
public sealed class MassFormulaRule : Rule<MassFormulaOptions>
{
    /// <inheritdoc />
    protected override IEnumerable<Finding> Check(IEntryView entry, MassFormulaOptions options, CancellationToken cancellationToken)
    {
        var structure = entry.Molecule is null ? null : entry.Perception?.Formula;
        var (findings, stated) = StatedFormulaCheck.Check(entry.Claims.Formula, entry.Molecule, structure);
        foreach (var finding in findings)
        {
            yield return finding;
        }

        var molecule = structure is not null ? MoleculeReference.FromStructure(entry.Molecule!, structure)
            : stated is not null ? MoleculeReference.FromStatedFormula(stated)
            : null;
        for (var i = 0; i < entry.Claims.Hrms.Count; i++)
        {
            cancellationToken.ThrowIfCancellationRequested();
            foreach (var finding in HrmsClaimCheck.Check(entry.Claims.Hrms[i], i, molecule, options))
            {
                yield return finding;
            }
        }
    }
}
