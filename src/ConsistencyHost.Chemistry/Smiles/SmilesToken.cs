namespace ConsistencyHost.Chemistry.Smiles;

/// <summary>An atom as written, before the valence model and kekulisation run.</summary>
internal sealed class ParsedAtom
{
    public int AtomicNumber { get; init; }
    public bool Aromatic { get; init; }
    public bool Bracket { get; init; }
    public int BracketHydrogens { get; init; }
    public int Charge { get; init; }
    public int Isotope { get; init; }
    public int AtomClass { get; init; }
    /// <summary>0 none, 1 '@', 2 '@@'.</summary>
    public int Chirality { get; init; }
    public int Offset { get; init; }
    /// <summary>True when the atom was bonded to a preceding atom when written.</summary>
    public bool HasPrevious { get; set; }
    /// <summary>Neighbours in written order; -1 implicit H; values below -1 are open ring placeholders.</summary>
    public List<int> Order { get; } = [];
}

/// <summary>A bond symbol as written.</summary>
internal readonly record struct BondSymbol(char Symbol, int Offset)
{
    public static readonly BondSymbol Implicit = new('\0', -1);

    public bool IsImplicit => Symbol == '\0';

    public int Order => Symbol switch
    {
        '=' => 2,
        '#' => 3,
        '$' => 4,
        _ => 1,
    };
}
