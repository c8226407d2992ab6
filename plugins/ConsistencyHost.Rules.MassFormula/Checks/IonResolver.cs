using ConsistencyHost.Rules.MassFormula.Ions;
using ConsistencyHost.Spectra.Model;

namespace ConsistencyHost.Rules.MassFormula.Checks;

/// <summary>Reads a claim's ion label and builds the ion from M; infers a common ion when no label is written.</summary>
internal static class IonResolver
{
    /// <summary>The ions tried, in this order, when a line states no ion label (common practice for ESI, then EI).</summary>
    private static readonly IReadOnlyList<string> CommonLabels = ["[M+H]+", "[M+Na]+", "[M+K]+", "[M+NH4]+", "[M-H]-", "M+•"];

    public static ResolvedIon Resolve(HrmsClaim claim, WrittenIonFormula? written, MoleculeReference? molecule, double tolerance)
    {
        if (claim.IonLabel is null)
        {
            return Infer(claim, written, molecule, tolerance);
        }

        var (label, problem) = IonLabelReader.Read(claim.IonLabel);
        if (label is null)
        {
            return ResolvedIon.NotRecognised(problem!);
        }

        if (molecule is null)
        {
            return new ResolvedIon(label, null, WithoutMolecule(label, written), null);
        }

        var (ion, why) = IonBuilder.Build(label, molecule.Composition, molecule.Charge);
        return ion is null ? ResolvedIon.NotRecognised($"{why} ({molecule.Description})") : new ResolvedIon(label, ion, [ion], null);
    }

    /// <summary>Without M, the written formula is either the ion itself or (as some authors write it) M.</summary>
    private static IReadOnlyList<Ion> WithoutMolecule(IonLabel label, WrittenIonFormula? written)
    {
        if (written is null) return [];
        var asIon = written.AsIon(label.Charge);
        var asMolecule = IonBuilder.Build(label, written.Composition, written.Charge).Ion;
        return asMolecule is null ? [asIon] : [asIon, asMolecule];
    }

    private static ResolvedIon Infer(HrmsClaim claim, WrittenIonFormula? written, MoleculeReference? molecule, double tolerance)
    {
        if (molecule is null)
        {
            return written is { Charge: not 0 } w
                ? new ResolvedIon(null, null, [w.AsIon(w.Charge)], null)
                : ResolvedIon.NotRecognised("the line states no ion, and without a structure or formula its charge is unknown");
        }

        // A written formula other than M's names the ion; M's own formula (or none) leaves only the number to go by.
        var byFormula = written is not null && !written.Composition.SameCounts(molecule.Composition);
        foreach (var text in CommonLabels)
        {
            var label = IonLabelReader.Read(text).Label!;
            if (IonBuilder.Build(label, molecule.Composition, molecule.Charge).Ion is not { } ion) continue;
            var fits = byFormula
                ? written!.Composition.SameCounts(ion.Composition)
                : CalculatedTolerance.Matches(claim.CalculatedMz, ion.Mz, tolerance) || CalculatedTolerance.Matches(claim.CalculatedMz, ion.MzWithoutElectron, tolerance);
            if (fits) return new ResolvedIon(label, ion, [ion], null);
        }

        return ResolvedIon.NotRecognised($"the line states no ion, and its calculated value and formula fit none of {string.Join(", ", CommonLabels)} of {molecule.Description}");
    }
}
