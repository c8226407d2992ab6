namespace ConsistencyHost.Spectra.Jcamp;

/// <summary>Groups records into ##TITLE= … ##END= blocks; LINK blocks hold their children and pass on their labels.</summary>
internal static class JcampBlockReader
{
    private sealed class Frame(int slot, JcampRecord title, Frame? parent)
    {
        public int Slot { get; } = slot;
        public JcampRecord Title { get; } = title;
        public Frame? Parent { get; } = parent;
        public List<JcampRecord> Records { get; } = [];
        public bool IsLink => Records.Any(r => r.Label == "DATATYPE" && r.FullValue.Equals("LINK", StringComparison.OrdinalIgnoreCase));
    }

    public static List<JcampBlock> Read(List<JcampRecord> records, JcampProblemSink sink)
    {
        var blocks = new List<JcampBlock?>();
        Frame? open = null;
        var lastLine = 0;
        foreach (var record in records)
        {
            lastLine = Math.Max(lastLine, record.Continuation.Count > 0 ? record.Continuation[^1].Number : record.Value.Number);
            if (record.Label == "TITLE") open = Open(record, open, blocks, sink);
            else if (record.Label == "END") open = Close(open, blocks, sink, record);
            else if (open is null) sink.Add(record.Value.Number, 1, "##" + record.RawLabel, JcampMessages.ExpectedTitleFirst);
            else open.Records.Add(record);
        }
        while (open is not null)
        {
            sink.Add(lastLine + 1, 1, "", JcampMessages.ExpectedEnd);
            open = Close(open, blocks, sink, null);
        }
        return [.. blocks.OfType<JcampBlock>()];
    }

    private static Frame Open(JcampRecord title, Frame? open, List<JcampBlock?> blocks, JcampProblemSink sink)
    {
        if (open is not null && !open.IsLink)
        {
            sink.Add(title.Value.Number, 1, "##" + title.RawLabel, JcampMessages.ExpectedEnd);
            open = Close(open, blocks, sink, null);
        }
        blocks.Add(null);
        return new Frame(blocks.Count - 1, title, open);
    }

    private static Frame? Close(Frame? frame, List<JcampBlock?> blocks, JcampProblemSink sink, JcampRecord? end)
    {
        if (frame is null)
        {
            if (end is not null) sink.Add(end.Value.Number, 1, "##END=", JcampMessages.ExpectedTitleFirst);
            return null;
        }
        var labels = Labels(frame);
        var spectrum = frame.IsLink ? null : PeakTableReader.Read(frame.Records, labels, sink, frame.Title.Value.Number);
        labels.TryGetValue("DATATYPE", out var dataType);
        labels.TryGetValue("BLOCKID", out var blockId);
        blocks[frame.Slot] = new JcampBlock(frame.Title.FullValue, dataType, frame.Records.Any(r => r.Label == "BLOCKID") ? blockId : null, labels, spectrum);
        return frame.Parent;
    }

    /// <summary>The enclosing LINK block's labels, overlaid with this block's own.</summary>
    private static Dictionary<string, string> Labels(Frame frame)
    {
        var labels = frame.Parent is null ? new Dictionary<string, string>(StringComparer.Ordinal) : Labels(frame.Parent);
        labels["TITLE"] = frame.Title.FullValue;
        foreach (var record in frame.Records) labels[record.Label] = record.FullValue;
        return labels;
    }
}
