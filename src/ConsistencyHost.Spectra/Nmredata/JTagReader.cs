namespace ConsistencyHost.Spectra.Nmredata;

/// <summary>Reads NMREDATA_J: "label1, label2, J[, nb=n]".</summary>
internal static class JTagReader
{
    public static List<NmredataCoupling> Read(List<LogicalLine> lines, HashSet<string> labels, NmredataProblemSink sink)
    {
        var result = new List<NmredataCoupling>();
        foreach (var line in lines)
        {
            var fields = Fields.Split(line.Text);
            if (fields.Count < 3 || !Fields.TryNumber(fields[2], out var hz))
            {
                sink.Add(line.Line, line.Text, NmredataMessages.ExpectedJLine);
                continue;
            }
            int? bonds = fields.Count > 3 && fields[3].StartsWith("nb=", StringComparison.OrdinalIgnoreCase)
                && int.TryParse(fields[3][3..], out var nb) ? nb : null;
            var (a, b) = (Fields.Unquote(fields[0]), Fields.Unquote(fields[1]));
            foreach (var label in new[] { a, b }.Where(l => !labels.Contains(l)))
                sink.Add(line.Line, label, NmredataMessages.ExpectedKnownLabel, ProblemSeverity.Warning);
            result.Add(new NmredataCoupling(a, b, hz, bonds, line.Line));
        }
        return result;
    }
}
