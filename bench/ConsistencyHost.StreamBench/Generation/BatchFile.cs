using System.Text;
using ConsistencyHost.Contract.V1;

namespace ConsistencyHost.StreamBench.Generation;

/// <summary>
/// N generated entries, cycling through the templates with unique ids (AIS-LQ-L000001, …): as requests for the
/// streaming call, or as one SD file in the form <c>consistencyhost batch</c> reads (docs/batch.md, "Input").
/// </summary>
internal sealed class BatchFile(IReadOnlyList<DemoEntry> templates)
{
    public static string EntryId(int index) => $"AIS-LQ-L{index + 1:D6}";

    public CheckEntryRequest Request(int index)
    {
        var entry = templates[index % templates.Count];
        var request = new CheckEntryRequest { EntryId = EntryId(index), Structure = new Structure { Molfile = entry.Molfile } };
        request.ReportedText.Add(entry.ProtonLine);
        request.ReportedText.Add(entry.CarbonLine);
        request.Claims = new Claims { Formula = entry.Formula };
        return request;
    }

    public void WriteSdFile(string path, int count)
    {
        using var output = new StreamWriter(path, append: false, new UTF8Encoding(false));
        for (var i = 0; i < count; i++)
        {
            var entry = templates[i % templates.Count];
            output.Write(entry.Molfile);
            Item(output, "ENTRY_ID", EntryId(i));
            Item(output, "NMR_1H", entry.ProtonLine);
            Item(output, "NMR_13C", entry.CarbonLine);
            Item(output, "FORMULA", entry.Formula);
            output.Write("$$$$\n");
        }
    }

    private static void Item(StreamWriter output, string name, string value) => output.Write($">  <{name}>\n{value}\n\n");
}
