using ConsistencyHost.Chemistry.Smiles;
using ConsistencyHost.Spectra.Analysis.Prediction;
using ConsistencyHost.Spectra.Analysis.Prediction.Carbon;
using ConsistencyHost.Spectra.Analysis.Prediction.Carbon.Aromatic;
using Xunit;

namespace ConsistencyHost.Spectra.Tests.Analysis.Prediction.Carbon;

/// <summary>Contract and properties of the 13C windows.</summary>
public sealed class CarbonShiftsBehaviourTests
{
    [Fact]
    public void Predict_AtomThatIsNotCarbon_SaysWhichAtomAndWhatWasExpected()
    {
        // Methyl acetate: atom 3 is the ester oxygen.
        var context = PredictionContext.Of(SmilesReader.Read("CC(=O)OC").Value!);

        var error = Assert.Throws<ArgumentException>(() => CarbonShifts.Predict(context, 3, "CDCl3"));
        Assert.Contains("Atom 3 is O, not carbon", error.Message);
    }

    [Fact]
    public void Predict_IndexOutsideTheMolecule_Throws()
    {
        var context = PredictionContext.Of(SmilesReader.Read("CC").Value!);

        Assert.Throws<ArgumentOutOfRangeException>(() => CarbonShifts.Predict(context, 5, null));
    }

    [Fact]
    public void RingTemplates_EveryTemplate_IsOneAromaticSystemWithAShiftForEachCarbon()
    {
        // A template our aromaticity perception does not see as one aromatic system could never match, and a carbon
        // without a tabulated shift would give no window.
        Assert.All(RingTemplates.Defined, t =>
        {
            Assert.True(t.IsUsable, t.Name);
            for (var i = 0; i < t.Atoms.Length; i++)
            {
                var isCarbon = t.Atoms[i].Kind is RingSystemAtom.CarbonKind or RingSystemAtom.OxoCarbonKind;
                Assert.True(!isCarbon || !double.IsNaN(t.Ppm[i]), $"{t.Name} atom {i}");
            }
        });
    }

    [Fact]
    public void Predict_SameMoleculeWrittenTwoWays_GivesTheSameWindows()
    {
        // Property: the windows belong to the structure, not to the atom order of the SMILES (methyl 4-methoxybenzoate).
        var first = Windows("COC(=O)c1ccc(OC)cc1");
        var second = Windows("c1(OC)ccc(C(OC)=O)cc1");

        Assert.Equal(first, second);
    }

    [Fact]
    public void Predict_CarboxylicAcidInDmso_MovesUpfieldAsTheImpurityTableDoes()
    {
        // Source: Gottlieb 1997 / Fulmer 2010: acetic acid C=O 175.99 (CDCl3), 171.93 (DMSO-d6).
        var cdcl3 = CarbonWindows.Of("CC(=O)O", 1, "CDCl3").Window.MostLikely;
        var dmso = CarbonWindows.Of("CC(=O)O", 1, "DMSO-d6").Window.MostLikely;

        Assert.InRange(cdcl3 - dmso, 3.0, 6.0);
    }

    [Fact]
    public void Predict_ArylTrifluoromethyl_CoversEveryQuartetLineAt100MHz()
    {
        // Common practice: ArCF3 ≈ 124 ppm, q, 1J(C,F) ≈ 272 Hz; at 100.6 MHz the outer lines lie ±4.06 ppm away.
        var window = CarbonWindows.Of("FC(F)(F)c1ccccc1", 1).Window;

        Assert.True(window.Contains(124.0 - 4.06) && window.Contains(124.0 + 4.06), window.ToString());
    }

    [Fact]
    public void Predict_Reasons_NameTheBaseTheIncrementsAndTheHalfWidth()
    {
        // Diethyl ether CH2: base −2.3, α C +9.1, α-OR +58.0 (Bacher/Pretsch table).
        var reasons = CarbonWindows.Of("CCOCC", 1).Reasons;

        Assert.Equal("base −2.3", reasons[0]);
        Assert.Contains("α-OR +58.0", reasons);
        Assert.StartsWith("±", reasons[^1]);
    }

    [Theory]
    [InlineData("c1ccc2[nH]ccc2c1", 6, 102.6)] // Source for the parent: Pretsch et al. 2009 (from memory), indole C-3
    [InlineData("c1ccc2ncccc2c1", 6, 121.1)]    // quinoline C-3 (same source)
    [InlineData("O=c1ccc2ccccc2o1", 2, 116.7)]  // coumarin C-3 (same source)
    public void Predict_ParentHeteroaromatic_UsesItsTemplateValue(string smiles, int atom, double tabulated)
    {
        var prediction = CarbonWindows.Of(smiles, atom);

        Assert.Equal(tabulated, prediction.Window.MostLikely, 1);
        Assert.Equal(ShiftBasis.TabulatedEnvironment, prediction.Basis);
    }

    private static List<(double, double)> Windows(string smiles)
    {
        var molecule = SmilesReader.Read(smiles).Value!;
        var context = PredictionContext.Of(molecule);
        return Enumerable.Range(0, molecule.AtomCount)
            .Where(a => molecule.Atoms[a].AtomicNumber == 6)
            .Select(a => CarbonShifts.Predict(context, a, "CDCl3").Window)
            .Select(w => (Math.Round(w.Low, 6), Math.Round(w.High, 6)))
            .Order()
            .ToList();
    }
}
