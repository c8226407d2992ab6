using ConsistencyHost.Contract.V1;

namespace ConsistencyHost.Cli.Batch;

/// <summary>
/// An SD file: each record is an NMReDATA record (it has NMREDATA_ items; passed whole as nmredata_record) or a
/// plain record whose MOL block is the structure and whose data items (<see cref="SdDataItems"/>) hold the
/// reported text. A record without "M  END" becomes an unreadable item naming its line.
/// </summary>
internal sealed class SdFileSource(string path) : IBatchSource
{
    private readonly string _name = Path.GetFileName(path);

    public int Count()
    {
        using var reader = File.OpenText(path);
        return SdRecordReader.Count(reader);
    }

    public IEnumerable<BatchItem> Read()
    {
        using var reader = File.OpenText(path);
        foreach (var record in SdRecordReader.Read(reader))
        {
            yield return ToItem(record);
        }
    }

    private BatchItem ToItem(SdRecordText record)
    {
        var source = $"{_name} record {record.Number} (line {record.FirstLine})";
        var items = record.DataItems().ToList();
        var entryId = items.FirstOrDefault(i => i.Name == SdDataItems.EntryId).Value is { Length: > 0 } id
            ? id
            : record.Lines.Count > 0 && record.Lines[0].Trim().Length > 0 ? record.Lines[0].Trim() : $"{_name} record {record.Number}";
        if (record.MolBlockEnd < 0)
        {
            return BatchItem.Unreadable(entryId, source, "has no MOL block ending in 'M  END'; expected a molfile followed by data items");
        }

        var request = new CheckEntryRequest { EntryId = entryId };
        if (items.Any(i => i.Name.StartsWith(SdDataItems.NmredataPrefix, StringComparison.Ordinal)))
        {
            request.NmredataRecord = record.Text;
            return BatchItem.Read(request, source);
        }

        request.Structure = new Structure { Molfile = string.Join('\n', record.Lines.Take(record.MolBlockEnd + 1)) + "\n" };
        request.ReportedText.AddRange(SdDataItems.ReportedText.SelectMany(name => items.Where(i => i.Name == name && i.Value.Length > 0).Select(i => i.Value)));
        if (items.FirstOrDefault(i => i.Name == SdDataItems.Formula).Value is { Length: > 0 } formula)
        {
            request.Claims = new Claims { Formula = formula };
        }

        return BatchItem.Read(request, source);
    }
}
