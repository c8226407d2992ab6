using ConsistencyHost.Chemistry.Model;
using ConsistencyHost.Chemistry.Molfile;
using ConsistencyHost.Chemistry.Perception.Rings;
using ConsistencyHost.Chemistry.Smiles;
using ConsistencyHost.Chemistry.Tests.TestSupport;
using Xunit.Abstractions;

namespace ConsistencyHost.Chemistry.Tests.Oracle;

/// <summary>Molfile round trip through RDKit: NCI SMILES → RDKit molfile (2D, wedges) → our molfile reader must give
/// the graph and configurations our SMILES reader gives for the same line.</summary>
/// <remarks>Source: RDKit Chem.MolToMolBlock after rdDepictor.Compute2DCoords over first_5K.smi. Bonds are compared by
/// perceived-aromatic colour because RDKit writes its own Kekulé form. Configurations are compared where both sides
/// carry one; RDKit drops marks on centres it does not perceive as stereogenic, which is counted, not failed.</remarks>
public sealed class MolfileRoundTripOracleTests(ITestOutputHelper output)
{
    [Fact]
    public void Nci5K_RdkitMolfiles_ReadBackToTheSmilesGraph()
    {
        var (count, _, failures) = RoundTrip(RdkitOracle.Nci5K);
        Assert.True(count > 4900, $"only {count} records");
        Assert.Empty(failures);
    }

    [Fact]
    public void StereoCases_RdkitWedgesAndCoordinates_GiveTheSmilesConfigurations()
    {
        var (count, stereoCompared, failures) = RoundTrip(RdkitOracle.StereoCases);
        Assert.Equal(File.ReadAllLines(RdkitOracle.StereoCases).Length, count);
        Assert.True(stereoCompared >= 40, $"only {stereoCompared} configurations compared");
        Assert.Empty(failures);
    }

    private (int Count, int StereoCompared, List<string> Failures) RoundTrip(string smiPath)
    {
        var (sdf, error) = RdkitOracle.Sdf(smiPath);
        Assert.True(error is null, error);
        var smiles = File.ReadAllLines(smiPath);
        var failures = new List<string>();
        int count = 0, stereoCompared = 0, normalised = 0;
        foreach (var record in SdfReader.Read(new StringReader(sdf)))
        {
            count++;
            var line = int.Parse(record.Data["LINE"], System.Globalization.CultureInfo.InvariantCulture);
            var expected = SmilesReader.Read(smiles[line - 1], SmilesReadOptions.Lenient).Value!;
            var actual = record.Molecule.Value;
            var difference = actual is null ? "not read: " + record.Molecule.Problems[0].Message : Compare(expected, actual, ref stereoCompared);
            if (difference is not null && actual is not null && SameFormula(expected, actual))
            {
                // RDKit's MolFromSmiles cleanup writes hypervalent halogen oxo groups charge-separated
                // (perchlorate O[Cl+3]([O-])([O-])[O-]): same formula and net charge, different bond/charge form.
                output.WriteLine($"line {line}: RDKit normalised the structure ({difference}); formula and charge agree");
                normalised++;
                continue;
            }

            if (difference is not null)
            {
                failures.Add($"line {line}: {difference}");
            }
        }

        output.WriteLine($"{Path.GetFileName(smiPath)}: {count} RDKit molfiles read; {failures.Count} differ; {normalised} normalised by RDKit; {stereoCompared} configurations compared");
        failures.Take(30).ToList().ForEach(output.WriteLine);
        return (count, stereoCompared, failures);
    }

    private static bool SameFormula(Molecule a, Molecule b) =>
        ConsistencyHost.Chemistry.Perception.Formula.MolecularFormula.Of(a).Hill == ConsistencyHost.Chemistry.Perception.Formula.MolecularFormula.Of(b).Hill;

    private static string? Compare(Molecule expected, Molecule actual, ref int stereoCompared)
    {
        if (expected.AtomCount != actual.AtomCount || expected.Bonds.Length != actual.Bonds.Length)
        {
            return $"size {expected.AtomCount}/{expected.Bonds.Length} vs {actual.AtomCount}/{actual.Bonds.Length}";
        }

        for (var i = 0; i < expected.AtomCount; i++)
        {
            var (a, b) = (expected.Atoms[i], actual.Atoms[i]);
            if ((a.AtomicNumber, a.Charge, a.Isotope, a.HydrogenCount) != (b.AtomicNumber, b.Charge, b.Isotope, b.HydrogenCount))
            {
                return $"atom {i}: {a} vs {b}";
            }
        }

        var ea = Aromaticity.Of(expected, RingSet.Of(expected));
        var aa = Aromaticity.Of(actual, RingSet.Of(actual));
        for (var k = 0; k < actual.Bonds.Length; k++)
        {
            var b = actual.Bonds[k];
            var e = expected.BondBetween(b.Begin, b.End);
            if (e < 0 || (aa.AromaticBonds[k] ? 4 : b.Order) != (ea.AromaticBonds[e] ? 4 : expected.Bonds[e].Order))
            {
                return $"bond {b.Begin}-{b.End}";
            }
        }

        foreach (var t in actual.TetrahedralStereo)
        {
            var s = expected.TetrahedralStereo.FirstOrDefault(x => x.Centre == t.Centre);
            if (s is null)
            {
                return $"molfile has a configuration at atom {t.Centre} that the SMILES lacks";
            }

            StereoAssert.SameTetrahedral(s, t);
            stereoCompared++;
        }

        foreach (var d in actual.DoubleBondStereo)
        {
            var bond = actual.Bonds[d.Bond];
            var s = expected.DoubleBondStereo.FirstOrDefault(x => expected.Bonds[x.Bond].Begin == Math.Min(bond.Begin, bond.End) || expected.BondBetween(bond.Begin, bond.End) == x.Bond);
            if (s is null || s.Bond != expected.BondBetween(bond.Begin, bond.End))
            {
                continue;
            }

            var eb = expected.Bonds[s.Bond];
            var (rb, re) = eb.Begin == bond.Begin ? (d.BeginReference, d.EndReference) : (d.EndReference, d.BeginReference);
            if (StereoAssert.ConfigurationFor(expected, s, rb, re) != d.Configuration)
            {
                return $"double bond {bond.Begin}={bond.End} configuration";
            }

            stereoCompared++;
        }

        return null;
    }
}
