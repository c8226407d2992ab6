using System.Globalization;
using ConsistencyHost.Chemistry.Perception.Symmetry;
using ConsistencyHost.Chemistry.Smiles;
using Xunit.Abstractions;

namespace ConsistencyHost.Chemistry.Tests.Oracle;

/// <summary>
/// Property: the stereo-aware classes and expected signal counts of a molecule do not depend on how its SMILES is
/// written. Each of the first 1,000 molecules of RDKit's NCI first-5K set (Debian rdkit-data) is written by RDKit
/// (python3-rdkit, Chem.MolToSmiles) three ways — RDKit's own atom order, a random atom order (Chem.RenumberAtoms)
/// and a random-order Kekulé form — and every atom is mapped back through RDKit's _smilesAtomOutputOrder.
/// Classes are compared up to the molecule's symmetry: each class is described by the constitutional orbits
/// (RDKit's CanonicalRankAtoms without tie-breaking) of its atoms, because which of two symmetric atoms pairs with
/// which — the two diastereotopic methyls of twin isopropyl groups, the odd substituent of an all-cis/trans
/// enumerated ring — is a choice of labels, not of chemistry.
/// </summary>
public sealed class InputFormInvarianceTests(ITestOutputHelper output)
{
    private const int Molecules = 1000;

    [Fact]
    public void Nci1000_ClassesAndCounts_SameForReorderedAndKekuleInput()
    {
        var (text, error) = RdkitOracle.Variants(RdkitOracle.Nci5K, Molecules);
        Assert.True(error is null, error);
        var lines = text.Split('\n', StringSplitOptions.RemoveEmptyEntries);
        Assert.Equal(Molecules, lines.Length);
        var differing = new List<string>();
        foreach (var line in lines)
        {
            var f = line.Split('\t');
            var ranks = Array.ConvertAll(f[7].Split(','), s => int.Parse(s, CultureInfo.InvariantCulture));
            var reference = Signature(f[1], f[2], ranks);
            foreach (var (smiles, order, form) in new[] { (f[3], f[4], "random order"), (f[5], f[6], "Kekulé") })
            {
                var other = Signature(smiles, order, ranks);
                if (other != reference)
                {
                    differing.Add($"{f[0]} {form}: {f[1]} → {reference} | {smiles} → {other}");
                }
            }
        }

        foreach (var d in differing) output.WriteLine(d);
        Assert.True(differing.Count == 0, string.Create(CultureInfo.InvariantCulture,
            $"{differing.Count} of {2 * Molecules} rewritten inputs gave other classes; first: {differing.FirstOrDefault()}"));
    }

    /// <summary>Classes and count ranges with every atom named by its RDKit orbit rank, in a canonical text form.</summary>
    private static string Signature(string smiles, string order, int[] ranks)
    {
        var read = SmilesReader.Read(smiles, SmilesReadOptions.Lenient);
        if (read.Value is null) return "unread: " + read.Problems[0].Message;
        var map = order.Length == 0 ? [] : Array.ConvertAll(order.Split(','), s => ranks[int.Parse(s, CultureInfo.InvariantCulture)]);
        if (map.Length != read.Value.AtomCount) return $"atoms {read.Value.AtomCount} vs {map.Length}";
        var e = NmrEquivalence.Of(read.Value);
        var hydrogens = e.HydrogenClasses
            .Select(c => string.Join(",", c.ParentAtoms.Select(a => map[a]).Order()) + (c.IsExchangeable ? "x" : ""))
            .Order(StringComparer.Ordinal);
        var carbons = e.CarbonClasses13C.Select(c => string.Join(",", c.Select(a => map[a]).Order())).Order(StringComparer.Ordinal);
        return string.Create(CultureInfo.InvariantCulture,
            $"H[{string.Join(" ", hydrogens)}] C[{string.Join(" ", carbons)}] 1H {e.Expected1H.Min}-{e.Expected1H.Max} 13C {e.Expected13C.Min}-{e.Expected13C.Max}");
    }
}
