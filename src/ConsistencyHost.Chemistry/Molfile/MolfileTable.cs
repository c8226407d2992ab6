namespace ConsistencyHost.Chemistry.Molfile;

/// <summary>An atom as read from a connection table, before valence and stereo processing.</summary>
internal sealed record MolfileAtom(string Symbol, int AtomicNumber, double X, double Y, double Z, int Charge, int Isotope, int Radical, int Line)
{
    public int Charge { get; set; } = Charge;
    public int Isotope { get; set; } = Isotope;
    public int Radical { get; set; } = Radical;
}

/// <summary>A bond as read: MDL type (1, 2, 3, 4 aromatic) and stereo (V2000 codes: 1 wedge, 6 hash, 4 either; 3 cis/trans either).</summary>
internal sealed record MolfileBond(int Begin, int End, int Type, int Stereo, int Line);

/// <summary>The connection table as read.</summary>
internal sealed class MolfileTable
{
    public List<MolfileAtom> Atoms { get; } = [];
    public List<MolfileBond> Bonds { get; } = [];

    /// <summary>Atom pairs (lower index first) already joined, with the 1-based line of that bond.</summary>
    public Dictionary<(int Low, int High), int> JoinedPairs { get; } = [];
}
