using ConsistencyHost.Chemistry.Model;

namespace ConsistencyHost.Chemistry.Tests.TestSupport;

/// <summary>Compares configurations independent of the neighbour order each reader chose.</summary>
internal static class StereoAssert
{
    public static void SameTetrahedral(TetrahedralStereo expected, TetrahedralStereo actual)
    {
        Assert.Equal(expected.Centre, actual.Centre);
        Assert.Equal(expected.Neighbours.Order(), actual.Neighbours.Order());
        var p = expected.Neighbours.Select(n => actual.Neighbours.IndexOf(n)).ToArray();
        var inversions = 0;
        for (var i = 0; i < 4; i++)
        {
            for (var j = i + 1; j < 4; j++)
            {
                inversions += p[i] > p[j] ? 1 : 0;
            }
        }

        var mapped = inversions % 2 == 0 ? actual.Winding : TetrahedralStereo.Invert(actual.Winding);
        Assert.Equal(expected.Winding, mapped);
    }

    public static DoubleBondConfiguration ConfigurationFor(Molecule m, DoubleBondStereo d, int beginReference, int endReference)
    {
        var flips = (d.BeginReference == beginReference ? 0 : 1) + (d.EndReference == endReference ? 0 : 1);
        return flips % 2 == 0 ? d.Configuration
            : d.Configuration == DoubleBondConfiguration.Cis ? DoubleBondConfiguration.Trans : DoubleBondConfiguration.Cis;
    }
}
