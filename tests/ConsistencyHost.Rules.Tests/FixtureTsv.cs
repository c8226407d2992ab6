namespace ConsistencyHost.Rules.Tests;

/// <summary>Reads a tab-separated fixture from the test output's Fixtures folder: cells per row, blank and '#' lines skipped.</summary>
internal static class FixtureTsv
{
    public static IEnumerable<string[]> Rows(string fileName) =>
        File.ReadLines(Path.Combine(AppContext.BaseDirectory, "Fixtures", fileName))
            .Where(line => line.Length > 0 && !line.StartsWith('#'))
            .Select(line => line.Split('\t'));
}
