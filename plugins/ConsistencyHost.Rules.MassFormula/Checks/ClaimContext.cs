using System.Globalization;
using ConsistencyHost.Sdk.Findings;
using ConsistencyHost.Spectra.Model;

namespace ConsistencyHost.Rules.MassFormula.Checks;

/// <summary>One HRMS claim with everything the checks need to judge it.</summary>
/// <param name="Claim">The claim as read.</param>
/// <param name="Index">Its position among the entry's HRMS claims (0-based).</param>
/// <param name="Written">The formula after "calcd for", read; null when unreadable.</param>
/// <param name="Ion">The ion the claim is about.</param>
/// <param name="Molecule">M; null when the entry has neither structure nor a readable stated formula.</param>
/// <param name="Tolerance">Tolerance for the calculated value, u.</param>
/// <param name="Options">The rule's options.</param>
internal sealed record ClaimContext(
    HrmsClaim Claim,
    int Index,
    WrittenIonFormula? Written,
    ResolvedIon Ion,
    MoleculeReference? Molecule,
    double Tolerance,
    MassFormulaOptions Options)
{
    /// <summary>How messages name the claim: "HRMS line 1 ([M+Na]+, calcd 217.0696)".</summary>
    public string Name => string.Create(CultureInfo.InvariantCulture,
        $"HRMS line {Index + 1} ({Claim.IonLabel ?? "no ion stated"}, calcd for {Claim.IonFormula} {MassText.Reported(Claim.CalculatedMz, Claim.CalculatedDecimals)})");

    /// <summary>Where the expected ion comes from: "the structure (C8H10N4O2) as [M+H]+", or "the written formula".</summary>
    public string IonSource => Molecule is not null && Ion.Label is not null
        ? $"{Molecule.Description} as {Ion.Label.Canonical}"
        : $"the written formula {Claim.IonFormula}";

    /// <summary>The finding located at this claim: its index, source offset and ion label added as evidence.</summary>
    public Finding Locate(Finding finding) =>
        finding
            .WithEvidence("hrms_index", Index)
            .WithEvidence("source_offset", Claim.SourceOffset)
            .WithEvidence("ion", Ion.Label?.Canonical ?? Claim.IonLabel ?? "");
}
