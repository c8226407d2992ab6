namespace ConsistencyHost.Spectra.Analysis.Prediction.Carbon.Carbonyl;

/// <summary>The carbon side of a carbonyl (or nitrile, imine) carbon, as the tables distinguish it.</summary>
internal enum SideKind : byte
{
    Methyl,
    Primary,
    Secondary,
    Tertiary,
    Aryl,
    FiveRingHeteroaryl,
    SixRingHeteroaryl,
    Vinyl,
    Alkynyl,
    Acyl,
    Perfluoroalkyl,
    Other,
}
