namespace ConsistencyHost.Spectra.Analysis.Prediction.Carbon.Aromatic;

/// <summary>How a ring system passes benzene increments on to its carbons.</summary>
internal enum RingKind : byte
{
    /// <summary>Benzene and fused benzenoid hydrocarbons: increments as tabulated.</summary>
    Benzenoid,

    /// <summary>Azines and benzazines: increments as tabulated, ipso of heteroatom substituents next to ring N halved.</summary>
    Azine,

    /// <summary>Five-membered heteroaromatics and their benzo-fused relatives: increments scaled by 1.2.</summary>
    FiveMembered,

    /// <summary>Rings carrying an exocyclic C=O (pyridones, pyrimidinones, coumarins): as azines, wider.</summary>
    Oxo,
}
