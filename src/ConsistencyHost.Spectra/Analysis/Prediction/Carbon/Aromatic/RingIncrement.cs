namespace ConsistencyHost.Spectra.Analysis.Prediction.Carbon.Aromatic;

/// <summary>Substituent increments on an aromatic ring carbon by position, with the printed name of the substituent.</summary>
/// <param name="Ipso">On the carbon carrying the substituent.</param>
/// <param name="Ortho">One bond away in the ring.</param>
/// <param name="Meta">Two bonds away.</param>
/// <param name="Para">Three bonds away.</param>
/// <param name="Name">The substituent as reasons print it.</param>
/// <param name="Spread">Extra uncertainty (ppm) of the row itself (rows from memory, rows standing for a family).</param>
internal sealed record RingIncrement(double Ipso, double Ortho, double Meta, double Para, string Name, double Spread)
{
    private readonly string[] labels = ["ipso-" + Name, "ortho-" + Name, "meta-" + Name, "para-" + Name];

    /// <summary>The increment at ring distance <paramref name="distance"/> (0 = ipso … 3 = para).</summary>
    public double At(int distance) => distance switch { 0 => Ipso, 1 => Ortho, 2 => Meta, _ => Para };

    /// <summary>The reason label at ring distance <paramref name="distance"/>.</summary>
    public string LabelAt(int distance) => labels[Math.Min(distance, 3)];
}
