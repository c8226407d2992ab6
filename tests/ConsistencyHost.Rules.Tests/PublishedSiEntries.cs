namespace ConsistencyHost.Rules.Tests;

/// <summary>One row of Fixtures/published-si-entries.tsv (published characterisation entries; sources per row).</summary>
internal sealed record PublishedSiEntry(string Id, string Name, string Smiles, string Text);

/// <summary>Reads the published SI corpus (how it was built and verified is in the fixture's header).</summary>
internal static class PublishedSiEntries
{
    private static readonly Lazy<IReadOnlyList<PublishedSiEntry>> Rows = new(Read);

    public static IReadOnlyList<PublishedSiEntry> All => Rows.Value;

    private static IReadOnlyList<PublishedSiEntry> Read()
    {
        return [.. FixtureTsv.Rows("published-si-entries.tsv").Select(cells => new PublishedSiEntry(cells[0], cells[2], cells[3], cells[4]))];
    }
}
