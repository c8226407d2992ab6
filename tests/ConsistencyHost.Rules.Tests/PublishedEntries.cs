namespace ConsistencyHost.Rules.Tests;

/// <summary>One row of Fixtures/published-impurities.tsv.</summary>
internal sealed record PublishedEntry(string Name, string Solvent, string Smiles, string Text);

/// <summary>Reads the published-impurity entries (sources in the fixture's header).</summary>
internal static class PublishedEntries
{
    private static readonly Lazy<IReadOnlyList<PublishedEntry>> Rows = new(Read);

    public static IReadOnlyList<PublishedEntry> All => Rows.Value;

    public static PublishedEntry Get(string name, string solvent) =>
        All.Single(e => e.Name == name && e.Solvent == solvent);

    private static IReadOnlyList<PublishedEntry> Read()
    {
        return [.. FixtureTsv.Rows("published-impurities.tsv").Select(cells => new PublishedEntry(cells[0], cells[1], cells[2], cells[3]))];
    }
}
