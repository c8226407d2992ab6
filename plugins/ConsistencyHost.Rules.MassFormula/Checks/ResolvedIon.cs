using ConsistencyHost.Rules.MassFormula.Ions;

namespace ConsistencyHost.Rules.MassFormula.Checks;

/// <summary>What one HRMS claim is about.</summary>
/// <param name="Label">The ion label read (or inferred when none is written); null when unusable.</param>
/// <param name="MoleculeIon">The ion built from M (structure or stated formula); null when there is no M or the label does not fit it.</param>
/// <param name="Candidates">The ions the calculated value may be for: the M ion, or without M the written formula read two ways.</param>
/// <param name="Problem">Why the ion is not recognised; null when it is.</param>
internal sealed record ResolvedIon(IonLabel? Label, Ion? MoleculeIon, IReadOnlyList<Ion> Candidates, string? Problem)
{
    /// <summary>An ion that could not be recognised.</summary>
    public static ResolvedIon NotRecognised(string problem) => new(null, null, [], problem);
}
