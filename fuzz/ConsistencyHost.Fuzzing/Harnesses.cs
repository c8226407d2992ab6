namespace ConsistencyHost.Fuzzing;

/// <summary>One harness per reader, by the name given on the command line.</summary>
/// <remarks>A harness lets every exception escape: the readers' contract is to report problems, never to
/// throw, so any exception (or a violated <see cref="Invariant"/>) is a crash for the fuzzer.</remarks>
internal static class Harnesses
{
    public static IReadOnlyDictionary<string, Action<string>> All { get; } = new Dictionary<string, Action<string>>(StringComparer.Ordinal)
    {
        ["smiles"] = ChemistryChecks.Smiles,
        ["molfile"] = ChemistryChecks.Molfile,
        ["sdf"] = ChemistryChecks.Sdf,
        ["reported"] = SpectraChecks.Reported,
        ["jcamp"] = SpectraChecks.Jcamp,
        ["nmredata"] = SpectraChecks.Nmredata,
    };
}
