namespace ConsistencyHost.Chemistry.Smiles;

/// <summary>Options for <see cref="SmilesReader"/>.</summary>
public sealed record SmilesReadOptions
{
    /// <summary>Strict OpenSMILES (the default).</summary>
    public static SmilesReadOptions Default { get; } = new();

    /// <summary>Lenient: the trade's usual deviations are read with warnings.</summary>
    public static SmilesReadOptions Lenient { get; } = new() { Strict = false };

    /// <summary>When true, an impossible valence or an unusable stereo mark is an error; when false, a
    /// warning and the atom keeps no implicit hydrogens / the mark is dropped.</summary>
    public bool Strict { get; init; } = true;

    /// <summary>When true, text after the first space or tab (a title, as in .smi files) is ignored.</summary>
    public bool AllowTitle { get; init; } = true;
}
