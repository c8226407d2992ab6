using ConsistencyHost.Sdk.Entries;
using ConsistencyHost.Spectra.Model;

namespace ConsistencyHost.Sdk.Testing.Entries;

/// <summary>
/// Builds an entry as the host hands it to rules: a structure, structured spectra, claims. Reported text is
/// read by a reader the test passes in, so a test can use the host's journal-text reader once it has one
/// (or a stand-in) without the kit depending on it.
/// </summary>
public sealed class EntryBuilder
{
    private readonly string _entryId;
    private readonly List<Spectrum> _spectra = [];
    private readonly List<Spectrum> _fromText = [];
    private StructureSource? _structure;
    private string? _formula;

    private EntryBuilder(string entryId) => _entryId = entryId;

    /// <summary>Starts an entry with the notebook's id, e.g. "AIS-LQ-0417".</summary>
    public static EntryBuilder Entry(string entryId) =>
        string.IsNullOrWhiteSpace(entryId) ? throw new ArgumentException("An entry needs a non-empty id.", nameof(entryId)) : new(entryId);

    /// <summary>The structure as SMILES.</summary>
    public EntryBuilder Smiles(string smiles) => With(() => _structure = new StructureSource(StructureFormat.Smiles, smiles));

    /// <summary>The structure as a molfile (V2000 or V3000 text).</summary>
    public EntryBuilder Molfile(string molfile) => With(() => _structure = new StructureSource(StructureFormat.Molfile, molfile));

    /// <summary>The molecular formula the entry states.</summary>
    public EntryBuilder Formula(string formula) => With(() => _formula = formula);

    /// <summary>A structured spectrum.</summary>
    public EntryBuilder Spectrum(Spectrum spectrum) => With(() => _spectra.Add(spectrum));

    /// <summary>A structured spectrum from a builder.</summary>
    public EntryBuilder Spectrum(SpectrumBuilder spectrum) => Spectrum(spectrum.Build());

    /// <summary>Characterisation text as pasted in the notebook, read by <paramref name="reader"/>; its spectra follow the structured ones, as in the host.</summary>
    public EntryBuilder ReportedText(string text, Func<string, IReadOnlyList<Spectrum>> reader) =>
        With(() => _fromText.AddRange(reader(text)));

    /// <summary>The entry.</summary>
    public Entry Build() => new()
    {
        EntryId = _entryId,
        Structure = _structure,
        Spectra = [.. _spectra, .. _fromText],
        Claims = _formula is null ? EntryClaims.None : new EntryClaims { Formula = _formula },
    };

    private EntryBuilder With(Action change)
    {
        change();
        return this;
    }
}
