namespace ConsistencyHost.Chemistry.Perception.Rings;

/// <summary>Incremental Gaussian elimination over GF(2) on bond bit sets.</summary>
internal sealed class Gf2Basis
{
    private readonly int words;
    private readonly List<(int Pivot, ulong[] Row)> rows = [];

    public Gf2Basis(int bits) => words = Math.Max(1, (bits + 63) / 64);

    public bool AddIfIndependent(IEnumerable<int> bits)
    {
        var v = new ulong[words];
        foreach (var b in bits)
        {
            v[b >> 6] ^= 1UL << (b & 63);
        }

        foreach (var (pivot, row) in rows)
        {
            if ((v[pivot >> 6] & (1UL << (pivot & 63))) != 0)
            {
                for (var i = 0; i < words; i++)
                {
                    v[i] ^= row[i];
                }
            }
        }

        var p = FirstBit(v);
        if (p < 0)
        {
            return false;
        }

        rows.Add((p, v));
        return true;
    }

    private static int FirstBit(ulong[] v)
    {
        for (var i = 0; i < v.Length; i++)
        {
            if (v[i] != 0)
            {
                return (i * 64) + System.Numerics.BitOperations.TrailingZeroCount(v[i]);
            }
        }

        return -1;
    }
}
