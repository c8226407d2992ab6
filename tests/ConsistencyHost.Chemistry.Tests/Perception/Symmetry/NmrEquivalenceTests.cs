using ConsistencyHost.Chemistry.Perception.Symmetry;
using ConsistencyHost.Chemistry.Smiles;

namespace ConsistencyHost.Chemistry.Tests.Perception.Symmetry;

public sealed class NmrEquivalenceTests
{
    [Theory]
    [MemberData(nameof(TopicityCases.Rows), MemberType = typeof(TopicityCases))]
    public void Of_TextbookCase_GivesPublishedClassCounts(string name, string smiles, int hydrogenClasses, int carbonClasses, string why)
    {
        var molecule = SmilesReader.Read(smiles).Value!;
        var result = NmrEquivalence.Of(molecule);
        Assert.True(hydrogenClasses == result.HydrogenClasses.Length, $"{name}: 1H classes {result.HydrogenClasses.Length}, expected {hydrogenClasses} ({why})");
        Assert.True(carbonClasses == result.CarbonClasses13C.Length, $"{name}: 13C classes {result.CarbonClasses13C.Length}, expected {carbonClasses} ({why})");
    }
}
