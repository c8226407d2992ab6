namespace ConsistencyHost.Engine.Intake;

/// <summary>
/// Explicit size limits on one entry, so that a huge or hostile entry is refused with a clear message
/// instead of exhausting memory. The defaults are far above any real notebook entry.
/// </summary>
public sealed record IntakeLimits
{
    /// <summary>The defaults.</summary>
    public static IntakeLimits Default { get; } = new();

    /// <summary>Longest entry id, characters.</summary>
    public int MaxEntryIdLength { get; init; } = 200;

    /// <summary>
    /// Longest SMILES, characters. 5,000 holds any structure under <see cref="MaxAtoms"/>; the SMILES reader slows
    /// down with the square of an unbroken chain's length (measured while fuzzing: 15,000 atoms take 1.6 s), so a
    /// longer text is refused before it is read.
    /// </summary>
    public int MaxSmilesLength { get; init; } = 5_000;

    /// <summary>Longest structure text, characters (a molfile of ~2,000 atoms).</summary>
    public int MaxStructureLength { get; init; } = 200_000;

    /// <summary>
    /// Most atoms in the structure (heavy atoms plus any hydrogens kept as atoms). Small-molecule entries
    /// rarely pass 150; 500 leaves room for large natural products while bounding the symmetry search.
    /// </summary>
    public int MaxAtoms { get; init; } = 500;

    /// <summary>Most spectra per entry.</summary>
    public int MaxSpectra { get; init; } = 32;

    /// <summary>Most signals per spectrum.</summary>
    public int MaxSignalsPerSpectrum { get; init; } = 2_000;

    /// <summary>Longest reported text or JCAMP-DX document, characters.</summary>
    public int MaxTextLength { get; init; } = 200_000;
}
