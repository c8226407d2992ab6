using ConsistencyHost.Chemistry.Perception.Stereo;

namespace ConsistencyHost.Chemistry.Perception.Symmetry;

/// <summary>All relative configurations of the unspecified stereo elements (nmr-methods.md §2.4).</summary>
/// <remarks>2^k assignments for k unspecified elements, halved when no tetrahedral centre is specified (the
/// mirror image gives the same spectrum). Above <see cref="MaxEnumerated"/> elements only the all-same and
/// alternating assignments are used, and the caller reports the range as estimated.</remarks>
internal static class StereoEnumeration
{
    public const int MaxEnumerated = 7;

    public static IEnumerable<(List<TetrahedralElement> Tetra, List<DoubleBondElement> Doubles)> Configurations(
        List<TetrahedralElement> tetra, List<DoubleBondElement> doubles)
    {
        var free = tetra.Count(t => !t.Specified) + doubles.Count(d => !d.Specified);
        var fixFirst = !tetra.Exists(t => t.Specified && t.Stereogenic) && tetra.Exists(t => !t.Specified);
        var bits = free - (fixFirst ? 1 : 0);
        IEnumerable<long> masks = bits <= MaxEnumerated
            ? Enumerable.Range(0, 1 << bits).Select(i => (long)i)
            : [0L, 0x5555_5555_5555_5555L];
        foreach (var mask in masks)
        {
            yield return Assign(tetra, doubles, fixFirst ? mask << 1 : mask);
        }
    }

    public static int UnspecifiedCount(List<TetrahedralElement> tetra, List<DoubleBondElement> doubles) =>
        tetra.Count(t => !t.Specified) + doubles.Count(d => !d.Specified);

    private static (List<TetrahedralElement>, List<DoubleBondElement>) Assign(
        List<TetrahedralElement> tetra, List<DoubleBondElement> doubles, long mask)
    {
        var bit = 0;
        var t2 = new List<TetrahedralElement>(tetra.Count);
        foreach (var t in tetra)
        {
            t2.Add(t.Specified ? t : t with { Parity = (int)((mask >> (bit++ % 63)) & 1) });
        }

        var d2 = new List<DoubleBondElement>(doubles.Count);
        foreach (var d in doubles)
        {
            d2.Add(d.Specified ? d : d with { Parity = (int)((mask >> (bit++ % 63)) & 1) });
        }

        return (t2, d2);
    }
}
