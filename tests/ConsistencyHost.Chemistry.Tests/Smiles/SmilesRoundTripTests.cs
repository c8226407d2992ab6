using ConsistencyHost.Chemistry.Smiles;
using ConsistencyHost.Chemistry.Tests.Oracle;
using ConsistencyHost.Chemistry.Tests.TestSupport;
using Xunit.Abstractions;

namespace ConsistencyHost.Chemistry.Tests.Smiles;

/// <summary>SMILES → molecule → SMILES → molecule keeps the graph and the configurations.</summary>
public sealed class SmilesRoundTripTests(ITestOutputHelper output)
{
    [Theory]
    [InlineData("C[C@H](O)CC")]
    [InlineData("F/C=C\\[C@H](Cl)Br")]
    [InlineData("C[C@H]1CC[C@@H](C)CC1")]
    [InlineData("c1cc[nH]c1")]
    [InlineData("[13CH3][N+](C)(C)C.[Cl-]")]
    [InlineData("C1CC2CCC1C2")]
    [InlineData("N[C@@H](Cc1ccccc1)C(=O)O")]
    [InlineData("C/C=C/C=C/C")]
    public void WriteThenRead_Example_KeepsGraph(string smiles)
    {
        var original = SmilesReader.Read(smiles).Value!;
        var (written, order) = SmilesWriter.WriteWithOrder(original);
        var copy = SmilesReader.Read(written);
        Assert.True(copy.Succeeded, written);
        Assert.Null(GraphAssert.Difference(original, copy.Value!, order));
    }

    [Fact]
    public void WriteThenRead_Nci5K_KeepsEveryGraph()
    {
        // Source of inputs: /usr/share/RDKit/Data/NCI/first_5K.smi (Debian rdkit-data).
        var failures = new List<string>();
        var count = 0;
        foreach (var line in File.ReadLines(RdkitOracle.Nci5K))
        {
            var original = SmilesReader.Read(line, SmilesReadOptions.Lenient).Value;
            if (original is null)
            {
                continue;
            }

            count++;
            var (written, order) = SmilesWriter.WriteWithOrder(original);
            var copy = SmilesReader.Read(written, SmilesReadOptions.Lenient).Value;
            var difference = copy is null ? "not readable" : GraphAssert.Difference(original, copy, order);
            if (difference is not null)
            {
                failures.Add($"{line.Split('\t')[0]} -> {written}: {difference}");
            }
        }

        output.WriteLine($"{count} molecules round-tripped, {failures.Count} failures");
        failures.Take(20).ToList().ForEach(output.WriteLine);
        Assert.True(count > 4900, $"only {count} read");
        Assert.Empty(failures);
    }
}
