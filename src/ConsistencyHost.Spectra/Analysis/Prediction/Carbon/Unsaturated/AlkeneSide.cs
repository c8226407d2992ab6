namespace ConsistencyHost.Spectra.Analysis.Prediction.Carbon.Unsaturated;

/// <summary>What one carbon of a C=C carries, as the increment sum and its corrections need it.</summary>
internal struct AlkeneSide
{
    /// <summary>Non-H substituents.</summary>
    public int Count;
    /// <summary>sp3 carbon substituents.</summary>
    public int Alkyl;
    /// <summary>A β carbon carries two or more alkyls.</summary>
    public bool BranchedBeta;
    /// <summary>A conjugated acceptor (C=O, CN, NO2, SO2) is attached.</summary>
    public bool Acceptor;
    /// <summary>That acceptor's bond lies in a ring.</summary>
    public bool AcceptorInRing;
    /// <summary>The acceptor is a ketone or aldehyde.</summary>
    public bool KetoneAcceptor;
    /// <summary>Extra half-width from the rows used.</summary>
    public double Spread;
}
