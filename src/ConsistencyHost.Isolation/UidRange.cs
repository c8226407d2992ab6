using System.Globalization;

namespace ConsistencyHost.Isolation;

/// <summary>
/// The user ids workers run under, one each (<c>Isolation:WorkerUidRange</c>, written "first-last"). The group id
/// of a worker is the same number. Uid 0 is never in a range: a worker must not be root.
/// </summary>
public readonly record struct UidRange(int First, int Last)
{
    /// <summary>
    /// The default, 700000000–700009999: far above the 16-bit ids of accounts and "nobody" (65534), above the blocks
    /// useradd hands out in /etc/subuid (100000 upwards, 65536 per user), and below 2^31 so every tool takes it.
    /// Ten thousand ids cover a host's plugins plus one per source-plugin compilation for a long life.
    /// </summary>
    public static UidRange Default { get; } = new(700_000_000, 700_009_999);

    /// <summary>How many ids the range holds.</summary>
    public int Count => Last - First + 1;

    /// <summary>True when <paramref name="uid"/> is in the range.</summary>
    public bool Contains(long uid) => uid >= First && uid <= Last;

    /// <summary>Reads "first-last" (both inclusive, 1 ≤ first ≤ last ≤ 2147483646); null with the problem when it is not that.</summary>
    public static UidRange? Parse(string text, out string? problem)
    {
        var parts = text.Split('-', StringSplitOptions.TrimEntries);
        problem = null;
        if (parts.Length != 2
            || !int.TryParse(parts[0], NumberStyles.None, CultureInfo.InvariantCulture, out var first)
            || !int.TryParse(parts[1], NumberStyles.None, CultureInfo.InvariantCulture, out var last))
        {
            problem = "expected two user ids as 'first-last', e.g. '700000000-700009999'";
            return null;
        }

        if (first < 1 || last < first || last > int.MaxValue - 1)
        {
            problem = "expected 1 ≤ first ≤ last ≤ 2147483646 (uid 0 is root; 2^31-1 and above are not used)";
            return null;
        }

        return new UidRange(first, last);
    }

    /// <inheritdoc />
    public override string ToString() => string.Create(CultureInfo.InvariantCulture, $"{First}-{Last}");
}
