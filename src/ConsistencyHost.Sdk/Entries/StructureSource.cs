namespace ConsistencyHost.Sdk.Entries;

/// <summary>The formats a structure can be submitted in.</summary>
public enum StructureFormat
{
    /// <summary>OpenSMILES text.</summary>
    Smiles = 1,
    /// <summary>CTfile molfile, V2000 or V3000.</summary>
    Molfile = 2,
}

/// <summary>The claimed structure exactly as submitted.</summary>
/// <param name="Format">Which reader applies.</param>
/// <param name="Text">The submitted text.</param>
public sealed record StructureSource(StructureFormat Format, string Text);
