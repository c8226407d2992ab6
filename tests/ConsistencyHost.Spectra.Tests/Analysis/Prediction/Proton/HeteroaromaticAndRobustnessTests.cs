using ConsistencyHost.Chemistry.Smiles;
using ConsistencyHost.Spectra.Analysis.Prediction;
using ConsistencyHost.Spectra.Analysis.Prediction.Proton;
using ConsistencyHost.Spectra.Analysis.Prediction.Proton.Aromatic;

namespace ConsistencyHost.Spectra.Tests.Analysis.Prediction.Proton;

/// <summary>Heteroaromatic parent positions and well-formed windows for every hydrogen-bearing atom.</summary>
public sealed class HeteroaromaticAndRobustnessTests
{
    [Fact]
    public void ParentTable_ReadsEveryParent_AndNamesDistinctPositions()
    {
        // Static construction throws on an unreadable SMILES or a shift list that does not fit its atoms.
        Assert.True(HeteroaromaticLookup.Count >= 60, $"{HeteroaromaticLookup.Count} positions");
    }

    // Source: Pretsch, Bühlmann & Badertscher 2009 §5.6 (transcribed), quinoline CDCl3 H-2 8.92, H-3 7.39, H-4 8.12,
    // H-8 8.15; isoquinoline H-1 9.22, H-3 8.50; thiophene H-2 7.31, H-3 7.09; 1-methylpyrrole (from memory) 6.62/6.08.
    [Theory]
    [InlineData("n1cccc2ccccc12", 1, 8.92)]
    [InlineData("n1cccc2ccccc12", 2, 7.39)]
    [InlineData("n1cccc2ccccc12", 3, 8.12)]
    [InlineData("n1cccc2ccccc12", 8, 8.15)]
    [InlineData("c1nccc2ccccc12", 0, 9.22)]
    [InlineData("c1nccc2ccccc12", 2, 8.50)]
    [InlineData("s1cccc1", 1, 7.31)]
    [InlineData("s1cccc1", 2, 7.09)]
    [InlineData("Cn1cccc1", 2, 6.62)]
    [InlineData("Cn1cccc1", 3, 6.08)]
    public void ParentPositions_HoldTheTabulatedShift(string smiles, int atom, double published)
    {
        ProtonWindows.AssertHolds(smiles, atom, "CDCl3", published);
    }

    [Fact]
    public void QuinolineAndIsoquinoline_H3Windows_TellTheIsomersApart()
    {
        // A quinoline drawn for isoquinoline data and the reverse (Pretsch 2009): isoquinoline H-3 8.50 must not fit
        // quinoline's H-3 window, nor quinoline H-3 7.39 isoquinoline's.
        var quinolineH3 = ProtonWindows.For("n1cccc2ccccc12", 2, "CDCl3");
        var isoquinolineH3 = ProtonWindows.For("c1nccc2ccccc12", 2, "CDCl3");
        Assert.False(quinolineH3.Window.Contains(8.50), ProtonWindows.Describe(quinolineH3));
        Assert.False(isoquinolineH3.Window.Contains(7.39), ProtonWindows.Describe(isoquinolineH3));
    }

    [Theory]
    [InlineData("[Na+].[O-]C(=O)c1ccccc1")]
    [InlineData("C[N+](C)(C)C")]
    [InlineData("[CH3]")]
    [InlineData("C=C=C")]
    [InlineData("[SiH4]")]
    [InlineData("B(O)(O)c1ccccc1")]
    [InlineData("c1cc[n+](C)cc1")]
    [InlineData("O=c1cc[nH]c(=O)[nH]1")]
    [InlineData("C1=CC=CC=CC=C1")]
    [InlineData("CC1(C)C2CCC1(C)C(=O)C2")]
    [InlineData("[2H]C([2H])([2H])O")]
    [InlineData("OP(=O)(O)O")]
    public void EveryHydrogenBearingAtom_GetsAWellFormedWindowWithReasons(string smiles)
    {
        var molecule = SmilesReader.Read(smiles).Value!;
        var context = PredictionContext.Of(molecule);
        foreach (var solvent in new string?[] { "CDCl3", "DMSO-d6", "C6D6", "D2O", "CD3OD", "acetone-d6", "CD3CN", null })
        {
            for (var atom = 0; atom < molecule.AtomCount; atom++)
            {
                if (molecule.Atoms[atom].HydrogenCount == 0) continue;
                var w = ProtonShifts.Predict(context, atom, solvent);
                Assert.True(w.Window.Low <= w.Window.MostLikely && w.Window.MostLikely <= w.Window.High, $"{smiles} {atom} {solvent}: {ProtonWindows.Describe(w)}");
                Assert.NotEmpty(w.Reasons);
            }
        }
    }
}
