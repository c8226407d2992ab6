using Xunit;

namespace ConsistencyHost.Spectra.Tests.Analysis.Prediction.Carbon;

/// <summary>
/// Benzo-fused five-membered rings and imide acetyl methyls, which the open-chain increments miss: each observed
/// shift must lie in its window. Observed values from memory of SDBS spectra and Pretsch et al. (2009), CDCl3.
/// </summary>
public sealed class FusedFiveRingCarbonTests
{
    [Theory]
    // Indane (SMILES atoms: 0 = C-2, 1 = C-1, 2 = C-7a, 3 = C-7, 4 = C-6): C-1 32.9, C-2 25.4, C-4/7 124.4,
    // C-5/6 126.1, C-3a/7a 144.0.
    [InlineData("C1Cc2ccccc2C1", 1, 32.9)]
    [InlineData("C1Cc2ccccc2C1", 0, 25.4)]
    [InlineData("C1Cc2ccccc2C1", 3, 124.4)]
    [InlineData("C1Cc2ccccc2C1", 4, 126.1)]
    [InlineData("C1Cc2ccccc2C1", 2, 144.0)]
    // 2,3-Dihydrobenzofuran (atoms: 1 = C-3, 3 = C-4, 6 = C-7; indoline alike): C-3 29.8, C-4 125.0, C-7 109.4.
    [InlineData("C1Cc2ccccc2O1", 1, 29.8)]
    [InlineData("C1Cc2ccccc2O1", 3, 125.0)]
    [InlineData("C1Cc2ccccc2O1", 6, 109.4)]
    // Indoline: C-3 29.9, C-4 124.6, C-7 109.4.
    [InlineData("C1Cc2ccccc2N1", 1, 29.9)]
    [InlineData("C1Cc2ccccc2N1", 3, 124.6)]
    [InlineData("C1Cc2ccccc2N1", 6, 109.4)]
    // 1,3-Benzodioxole: C-4 108.6.
    [InlineData("C1Oc2ccccc2O1", 3, 108.6)]
    // 1-Indanone (atoms: 3 = C-3, 4 = C-3a, 8 = C-7; phthalide alike): C-3 25.8, C-3a 155.1, C-7 123.7.
    [InlineData("O=C1CCc2ccccc21", 3, 25.8)]
    [InlineData("O=C1CCc2ccccc21", 4, 155.1)]
    [InlineData("O=C1CCc2ccccc21", 8, 123.7)]
    // Phthalide: C-3a 146.5, C-4 122.1, C-7 125.7.
    [InlineData("O=C1OCc2ccccc21", 4, 146.5)]
    [InlineData("O=C1OCc2ccccc21", 5, 122.1)]
    [InlineData("O=C1OCc2ccccc21", 8, 125.7)]
    public void Predict_BenzoFusedFiveRing_WindowHoldsTheObservedShift(string smiles, int atom, double observed)
    {
        var window = CarbonWindows.Of(smiles, atom).Window;

        Assert.True(window.Contains(observed), $"{smiles} atom {atom}: {observed} outside {window.Low:0.0}–{window.High:0.0}");
    }

    [Theory]
    // Tetralin C-5 129.2 (atom 4) and C-1 29.4 (atom 2): six-membered fused rings keep the plain sum, no five-ring
    // correction.
    [InlineData("C1CCc2ccccc2C1", 4, 129.2)]
    [InlineData("C1CCc2ccccc2C1", 2, 29.4)]
    public void Predict_BenzoFusedSixRing_NotCorrectedAndStillHoldsTheObservedShift(string smiles, int atom, double observed)
    {
        var prediction = CarbonWindows.Of(smiles, atom);

        Assert.True(prediction.Window.Contains(observed));
        Assert.DoesNotContain(prediction.Reasons, r => r.Contains("5-ring", StringComparison.Ordinal));
    }

    [Theory]
    // Diacetamide CH3 24.9, N,N-diacetylaniline 26.1, 3-acetyl-2-oxazolidinone 23.8.
    [InlineData("CC(=O)NC(C)=O", 0, 24.9)]
    [InlineData("CC(=O)N(C(C)=O)c1ccccc1", 0, 26.1)]
    [InlineData("CC(=O)N1CCOC1=O", 0, 23.8)]
    public void Predict_ImideAcetylMethyl_WindowHoldsTheObservedShift(string smiles, int atom, double observed)
    {
        var prediction = CarbonWindows.Of(smiles, atom);

        Assert.True(prediction.Window.Contains(observed), $"{observed} outside {prediction.Window.Low:0.0}–{prediction.Window.High:0.0}");
        Assert.Contains(prediction.Reasons, r => r.Contains("imide", StringComparison.Ordinal));
    }
}
