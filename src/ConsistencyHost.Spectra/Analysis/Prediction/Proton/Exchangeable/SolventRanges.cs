namespace ConsistencyHost.Spectra.Analysis.Prediction.Proton.Exchangeable;

/// <summary>A plausible range with its most likely value, ppm.</summary>
internal readonly record struct Range(double Low, double High, double Likely);

/// <summary>The range of one exchangeable class in each aprotic solvent group.</summary>
/// <param name="Chloroform">CDCl3, CD2Cl2.</param>
/// <param name="Dmso">DMSO-d6.</param>
/// <param name="Acetone">acetone-d6, THF-d8.</param>
/// <param name="Acetonitrile">CD3CN.</param>
/// <param name="Benzene">C6D6, toluene-d8.</param>
internal sealed record SolventRanges(Range Chloroform, Range Dmso, Range Acetone, Range Acetonitrile, Range Benzene)
{
    /// <summary>The same range in every solvent.</summary>
    public static SolventRanges Everywhere(double low, double high, double likely)
    {
        var r = new Range(low, high, likely);
        return new SolventRanges(r, r, r, r, r);
    }
}
