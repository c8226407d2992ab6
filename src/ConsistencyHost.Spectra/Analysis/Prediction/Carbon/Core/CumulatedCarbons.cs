namespace ConsistencyHost.Spectra.Analysis.Prediction.Carbon.Core;

/// <summary>Carbons with two double bonds other than allenes: isocyanates, isothiocyanates, carbodiimides, ketenes, CO2.</summary>
/// <remarks>From memory (Pretsch et al. 2009): alkyl isocyanates 122, aryl 124.8; isothiocyanates 129–140, broad and
/// often not reported; carbodiimides 135–141 (DCC 139.9); ketene central carbons 190–205; CO2 125; ketenimines
/// 185–200.</remarks>
internal static class CumulatedCarbons
{
    /// <summary>The window for a carbon double-bonded to elements <paramref name="a"/> and <paramref name="b"/>.</summary>
    public static ShiftPrediction Predict(int a, int b)
    {
        var (low, high) = a <= b ? (a, b) : (b, a);
        var row = (low, high) switch
        {
            (Topology.Nitrogen, Topology.Oxygen) => new Tabulated(123.5, 4.0, "isocyanate N=C=O"),
            (Topology.Nitrogen, Topology.Sulfur) => new Tabulated(134.0, 7.0, "isothiocyanate N=C=S"),
            (Topology.Nitrogen, Topology.Nitrogen) => new Tabulated(138.5, 4.5, "carbodiimide N=C=N"),
            (Topology.Carbon, Topology.Oxygen) => new Tabulated(197.0, 10.0, "ketene C=C=O"),
            (Topology.Carbon, Topology.Nitrogen) => new Tabulated(192.0, 10.0, "ketenimine C=C=N"),
            (Topology.Oxygen, Topology.Oxygen) => new Tabulated(125.0, 3.0, "CO2"),
            _ => new Tabulated(160.0, 40.0, "cumulated carbon"),
        };
        return row.ToPrediction();
    }
}
