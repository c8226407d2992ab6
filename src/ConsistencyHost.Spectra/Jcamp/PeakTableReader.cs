using System.Globalization;
using ConsistencyHost.Spectra.Model;

namespace ConsistencyHost.Spectra.Jcamp;

/// <summary>Reads a block's ##PEAK TABLE= or ##PEAK ASSIGNMENTS= into a spectrum, with its metadata labels.</summary>
internal static class PeakTableReader
{
    private static readonly string[] FullSpectrumLabels = ["XYDATA", "NTUPLES", "DATATABLE", "XYPOINTS"];

    public static Spectrum? Read(List<JcampRecord> records, Dictionary<string, string> labels, JcampProblemSink sink, int titleLine)
    {
        var table = records.LastOrDefault(r => r.Label is "PEAKTABLE" or "PEAKASSIGNMENTS");
        if (table is null)
        {
            if (records.FirstOrDefault(r => FullSpectrumLabels.Contains(r.Label)) is { } full)
                sink.Add(full.Value.Number, 1, "##" + full.RawLabel, JcampMessages.ExpectedPeakTable, ProblemSeverity.Warning);
            return null;
        }
        var context = PeakContext.From(labels, records, sink, titleLine);
        var peaks = table.Label == "PEAKTABLE" ? TupleReader.ReadTable(table, sink) : TupleReader.ReadAssignments(table, sink);
        if (peaks is null) return null;
        CheckNpoints(records, peaks.Count, sink);
        return new Spectrum
        {
            Nucleus = context.Nucleus,
            FrequencyMHz = context.FrequencyMHz,
            Solvent = context.Solvent,
            TemperatureK = context.TemperatureK,
            Signals = [.. peaks.Select(p => context.ToSignal(p, table, sink)).OfType<Signal>()],
        };
    }

    private static void CheckNpoints(List<JcampRecord> records, int count, JcampProblemSink sink)
    {
        if (records.LastOrDefault(r => r.Label == "NPOINTS") is not { } npoints) return;
        if (int.TryParse(npoints.FullValue, NumberStyles.Integer, CultureInfo.InvariantCulture, out var declared) && declared == count) return;
        sink.Add(npoints.Value.Number, npoints.Value.ColumnOffset + 1, npoints.FullValue, JcampMessages.ExpectedNpoints);
    }
}
