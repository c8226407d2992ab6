using ConsistencyHost.Chemistry.Perception.Symmetry;
using ConsistencyHost.Chemistry.Smiles;

namespace ConsistencyHost.Chemistry.Tests.Perception.Symmetry;

/// <summary>Ring-fusion, spiro, cage and bridgehead stereo patterns of issue 16. Every expected class list is the
/// issue's hand analysis of the point-group symmetry (parent heavy-atom indices, 0-based in SMILES order, one
/// entry per H); lists marked "all" are every H class of the molecule, the others must be among its classes.</summary>
public sealed class RingSystemStereoTests
{
    public static TheoryData<string, string, string, bool> Rows => new()
    {
        // name, SMILES, expected H classes (";"-separated, parents ","-separated), the list is all classes
        { "chiral ring-fusion CH (benzo-fused indolizidine): every CH2 pair splits (hand analysis, issue 16)",
            "C1Cc2ccccc2[C@H]2CCCN12", "0;0;1;1;9;9;10;10;11;11", false },
        { "1-acetyladamantane: bridgehead CH fixed by the cage, distal CH2 H diastereotopic (hand analysis, issue 16)",
            "CC(=O)C12CC3CC(CC(C3)C1)C2", "0,0,0;4,4,11,11,12,12;5,7,9;6,8,10;6,8,10", true },
        { "N-methylhexaminium: bridgehead N cannot invert (hand analysis, issue 16)",
            "C[N+]12CN3CN(CN(C3)C1)C2", "0,0,0;2,2,9,9,10,10;4,6,8;4,6,8", true },
        { "Troeger's base dimethyl analogue: C2-symmetric, ArCH2N protons diastereotopic (hand analysis, issue 16)",
            "CC1=CC2=C(C=C1)N3CC4=C(C=CC(=C4)C)N(C2)C3", "8,17;8,17", false },
        { "1-oxaspiro[4.4]nonan-2-one: spiro atom joins a symmetric and an unsymmetric ring (hand analysis, issue 16)",
            "O=C1CCC2(CCCC2)O1", "2,2;3,3;5,8;5,8;6,7;6,7", true },
    };

    [Theory]
    [MemberData(nameof(Rows))]
    public void Of_RingSystemCase_GivesHandAnalysedClasses(string name, string smiles, string expected, bool complete)
    {
        var result = NmrEquivalence.Of(SmilesReader.Read(smiles).Value!);
        var actual = result.HydrogenClasses.Select(c => string.Join(",", c.ParentAtoms)).ToList();
        var wanted = expected.Split(';').ToList();
        var message = $"{name}: got [{string.Join("] [", actual)}]";
        if (complete)
        {
            Assert.True(wanted.Order().SequenceEqual(actual.Order()), message);
            return;
        }

        var remaining = new List<string>(actual);
        foreach (var w in wanted)
        {
            Assert.True(remaining.Remove(w), message + $"; missing [{w}]");
        }
    }

    [Fact]
    public void Of_SpiroQuinolizidineWithTrueStereocentreAtRingFusion_KeepsCyclohexaneHalvesApart()
    {
        // Hand analysis (issue 16): C14 is a true stereocentre, so C3/C7 and C4/C6 of the cyclohexane are not related.
        var result = NmrEquivalence.Of(SmilesReader.Read("CO[C@H]1CC[C@]2(CC1)CCN1CCC[C@@H]21").Value!);
        Assert.DoesNotContain(result.CarbonClasses13C, c => c.Contains(3) && c.Contains(7));
        Assert.DoesNotContain(result.CarbonClasses13C, c => c.Contains(4) && c.Contains(6));
    }

    [Fact]
    public void Of_OctahedralCobaltPentammine_GivesARangeThatHoldsCisAndTransAmmines()
    {
        // Hand analysis (issue 16): as an octahedron, [Co(NH3)5(OAc)]2+ has the four NH3 cis to the acetate as one
        // class and the trans NH3 as another (2 NH3 environments + CH3 = 3 H classes). The graph alone cannot say
        // so; the range must hold 3 and say why, never a confident 2.
        var result = NmrEquivalence.Of(SmilesReader.Read("N[Co+2](N)(N)(N)(N)OC(C)=O", SmilesReadOptions.Lenient).Value!);
        Assert.InRange(3, result.Expected1H.Min, result.Expected1H.Max);
        Assert.Contains(result.Expected1H.Reasons, r => r.Contains("coordination geometry", StringComparison.Ordinal));
    }

    [Fact]
    public void Of_OrganicMoleculeWithoutMetal_HasNoGeometryReason()
    {
        var result = NmrEquivalence.Of(SmilesReader.Read("CC(=O)C12CC3CC(CC(C3)C1)C2").Value!);
        Assert.DoesNotContain(result.Expected1H.Reasons, r => r.Contains("coordination geometry", StringComparison.Ordinal));
    }
}
