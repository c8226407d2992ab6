using System.Globalization;
using ConsistencyHost.Spectra.Model;

namespace ConsistencyHost.Spectra.Nmredata;

/// <summary>
/// Reads NMReDATA SD text: per record the MOL block (kept as molfile text), NMREDATA_VERSION, FORMULA, SMILES,
/// SOLVENT, TEMPERATURE, ASSIGNMENT, J and the NMREDATA_1D_* spectra; every problem with its line number.
/// </summary>
/// <remarks>
/// Pupier et al., Magn. Reson. Chem. 2018, 56, 703 and the format's own tag description (version 1.0/1.1 line
/// conventions: backslash continuation, ';' comments, ", " separators). 2D tags are kept as raw lines in
/// <see cref="NmredataRecord.Tags"/>, not interpreted.
/// </remarks>
public static class NmredataReader
{
    /// <summary>Longest text read, in characters.</summary>
    public const int MaxTextLength = 10_000_000;

    private const string OneDPrefix = "NMREDATA_1D_";

    /// <summary>Reads every record of <paramref name="sdText"/>.</summary>
    public static NmredataResult Read(string sdText)
    {
        ArgumentNullException.ThrowIfNull(sdText);
        var sink = new NmredataProblemSink();
        if (sdText.Length > MaxTextLength)
        {
            sink.AddMessage(1, NmredataMessages.ExpectedShorterText, NmredataMessages.TextTooLong(sdText.Length, MaxTextLength));
            return new NmredataResult { Problems = sink.Problems };
        }
        var records = SdRecordSplitter.Split(sdText, sink).Select(r => ReadRecord(r, sink)).ToList();
        return new NmredataResult { Records = records, Problems = [.. sink.Problems.OrderBy(p => p.Line)] };
    }

    private static NmredataRecord ReadRecord(SdRecord record, NmredataProblemSink sink)
    {
        var version = record.Tags.FirstOrDefault(t => t.Name == "NMREDATA_VERSION") is { } v ? First(v, false, sink) : null;
        var version11 = version is not null && double.TryParse(version, NumberStyles.Float, CultureInfo.InvariantCulture, out var n) && n >= 1.1;
        var logical = record.Tags.Select(t => (Tag: t, Lines: LogicalLines.Of(t, version11, sink))).ToList();
        var lines = new Dictionary<string, List<LogicalLine>>(StringComparer.Ordinal);
        foreach (var (tag, tagLines) in logical)
            if (!lines.TryAdd(tag.Name, tagLines)) sink.Add(tag.HeaderLine, tag.Name, NmredataMessages.ExpectedUniqueTag, ProblemSeverity.Warning);
        var assignments = lines.TryGetValue("NMREDATA_ASSIGNMENT", out var a) ? AssignmentTagReader.Read(a, record.AtomCount, sink) : [];
        var labels = assignments.Select(x => x.Label).ToHashSet(StringComparer.Ordinal);
        var solvent = Single(lines, "NMREDATA_SOLVENT") is { } s ? SolventNames.Normalise(s) ?? s : null;
        var context = new ReaderContext(sink, labels, solvent, Temperature(record, lines, sink));
        var oneD = logical.Where(x => x.Tag.Name.StartsWith(OneDPrefix, StringComparison.Ordinal))
            .Select(x => (x.Tag.Name, Spectrum: OneD(x.Tag, x.Lines, context))).Where(x => x.Spectrum is not null).ToList();
        return new NmredataRecord
        {
            MolfileText = record.MolfileText,
            Version = version,
            Formula = Single(lines, "NMREDATA_FORMULA"),
            Smiles = Single(lines, "NMREDATA_SMILES"),
            Solvent = solvent,
            TemperatureK = context.TemperatureK,
            Assignments = assignments,
            Couplings = lines.TryGetValue("NMREDATA_J", out var j) ? JTagReader.Read(j, labels, sink) : [],
            Spectra = [.. oneD.Select(x => x.Spectrum!)],
            SpectrumTags = [.. oneD.Select(x => x.Name)],
            Tags = lines.ToDictionary(kv => kv.Key, kv => (IReadOnlyList<string>)[.. kv.Value.Select(l => l.Text)]),
        };
    }

    /// <summary>A plain 1D tag ("NMREDATA_1D_13C", "NMREDATA_1D_1H#2"); selective 1D tags (…_D_1H) are kept raw only.</summary>
    private static Spectrum? OneD(SdTag tag, List<LogicalLine> lines, ReaderContext context)
    {
        var isotope = tag.Name[OneDPrefix.Length..].Split('#')[0];
        if (isotope.Contains('_')) return null;
        var nucleus = NucleusNames.Parse(isotope);
        if (nucleus != Nucleus.Unknown) return OneDTagReader.Read(nucleus, tag, lines, context);
        context.Sink.Add(tag.HeaderLine, tag.Name, NmredataMessages.ExpectedKnownNucleus, ProblemSeverity.Warning);
        return null;
    }

    /// <summary>"298.0 K" (version 1.0 and later) or a bare "298.15" (version 0.93 files).</summary>
    private static double? Temperature(SdRecord record, Dictionary<string, List<LogicalLine>> lines, NmredataProblemSink sink)
    {
        if (!lines.TryGetValue("NMREDATA_TEMPERATURE", out var t) || t.Count == 0) return null;
        var text = t[0].Text;
        var number = text.EndsWith('K') ? text[..^1].Trim() : text;
        if (Fields.TryNumber(number, out var kelvin)) return kelvin;
        sink.Add(t[0].Line, text, NmredataMessages.ExpectedTemperature);
        return null;
    }

    private static string? Single(Dictionary<string, List<LogicalLine>> lines, string tag) =>
        lines.TryGetValue(tag, out var l) && l.Count > 0 ? l[0].Text : null;

    private static string? First(SdTag tag, bool version11, NmredataProblemSink sink) =>
        LogicalLines.Of(tag, version11, sink).Select(l => l.Text).FirstOrDefault();
}
