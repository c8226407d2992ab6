namespace ConsistencyHost.Spectra.Solvents;

/// <summary>How a tabulated value was obtained (marks of docs/spectra.md, after the reference notes).</summary>
public enum Provenance
{
    /// <summary>Read in a published copy of the source table.</summary>
    Published,
    /// <summary>Read in a third-party transcription of the source table; every cell compared with a published copy matched.</summary>
    Transcription,
    /// <summary>From memory of the cited table; not confirmed in a published copy.</summary>
    FromMemory,
}

/// <summary>Names of the published tables the data come from.</summary>
public static class SolventSources
{
    /// <summary>Gottlieb, Kotlyar, Nudelman, J. Org. Chem. 1997, 62, 7512–7515 (DOI 10.1021/jo971176v).</summary>
    public const string Gottlieb1997 = "Gottlieb, Kotlyar, Nudelman, J. Org. Chem. 1997, 62, 7512";

    /// <summary>Fulmer et al., Organometallics 2010, 29, 2176–2179 (DOI 10.1021/om100106e).</summary>
    public const string Fulmer2010 = "Fulmer et al., Organometallics 2010, 29, 2176";

    /// <summary>UCLA "Notes on NMR Solvents" page (multiplicities of solvent signals).</summary>
    public const string UclaSolventNotes = "UCLA webspectra, Notes on NMR Solvents";
}

/// <summary>Where one tabulated value comes from.</summary>
/// <param name="Source">A <see cref="SolventSources"/> name.</param>
/// <param name="Provenance">Published copy, transcription or memory.</param>
public readonly record struct DataSource(string Source, Provenance Provenance)
{
    /// <inheritdoc />
    public override string ToString() => Provenance switch
    {
        Provenance.Published => Source,
        Provenance.Transcription => Source + " (via a transcription)",
        _ => Source + " [M] from memory",
    };
}
