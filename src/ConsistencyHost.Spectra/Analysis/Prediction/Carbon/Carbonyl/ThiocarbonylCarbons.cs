using ConsistencyHost.Spectra.Analysis.Prediction.Carbon.Core;

namespace ConsistencyHost.Spectra.Analysis.Prediction.Carbon.Carbonyl;

/// <summary>C=S carbons by their two neighbours.</summary>
/// <remarks>
/// From memory (Pretsch et al. 2009; Kalinowski et al. 1988): thioamides 198–207 (thioacetamide 207, thiobenzamide
/// 201), thioureas 179–184 (tetramethylthiourea 193.6), dithiocarbamate esters 195–197, xanthates 211–215,
/// trithiocarbonates 219–225, dithioesters 220–230, thionoesters 210–220, thionocarbamates 186–190,
/// thionocarbonates 191–196, thiocarbonyl imidazolides 180–185, thioketones 220–250.
/// </remarks>
internal static class ThiocarbonylCarbons
{
    /// <summary>The window of thiocarbonyl carbon <paramref name="carbon"/>.</summary>
    public static ShiftPrediction Predict(PredictionContext context, int carbon, int sulfur)
    {
        var m = context.Molecule;
        var n = CarbonylNeighbours.Of(context, carbon, sulfur);
        var a = n.First < 0 ? 1 : m.Atoms[n.First].AtomicNumber;
        var b = n.Second < 0 ? 1 : m.Atoms[n.Second].AtomicNumber;
        var (low, high) = a <= b ? (a, b) : (b, a);
        var row = (low, high) switch
        {
            (Topology.Nitrogen, Topology.Nitrogen) => AnyAromaticNitrogen(context, n) ? new Tabulated(182.0, 5.0, "thiocarbonyl diazole C=S")
                : m.Atoms[n.First].HydrogenCount + m.Atoms[n.Second].HydrogenCount == 0 ? new Tabulated(192.0, 5.0, "tetrasubstituted thiourea C=S")
                : new Tabulated(181.5, 4.5, "thiourea C=S"),
            (1 or Topology.Carbon, Topology.Nitrogen) => new Tabulated(201.0, 8.0, "thioamide C=S"),
            (Topology.Nitrogen, Topology.Sulfur) => new Tabulated(197.0, 6.0, "dithiocarbamate C=S"),
            (Topology.Oxygen, Topology.Sulfur) => new Tabulated(213.0, 4.5, "xanthate C=S"),
            (Topology.Sulfur, Topology.Sulfur) => new Tabulated(222.0, 4.5, "trithiocarbonate C=S"),
            (1 or Topology.Carbon, Topology.Sulfur) => new Tabulated(226.0, 9.0, "dithioester C=S"),
            (1 or Topology.Carbon, Topology.Oxygen) => new Tabulated(215.0, 8.0, "thionoester C=S"),
            (Topology.Nitrogen, Topology.Oxygen) => new Tabulated(188.0, 4.5, "thionocarbamate C=S"),
            (Topology.Oxygen, Topology.Oxygen) => new Tabulated(193.5, 4.0, "thionocarbonate C=S"),
            (Topology.Carbon, Topology.Carbon) => new Tabulated(235.0, 15.0, "thioketone C=S"),
            _ => new Tabulated(200.0, 25.0, "thiocarbonyl C=S"),
        };
        return row.ToPrediction();
    }

    private static bool AnyAromaticNitrogen(PredictionContext context, CarbonylNeighbours n) =>
        context.IsAromatic(n.First) || (n.Second >= 0 && context.IsAromatic(n.Second));
}
