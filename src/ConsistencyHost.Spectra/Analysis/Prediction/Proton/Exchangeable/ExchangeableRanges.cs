namespace ConsistencyHost.Spectra.Analysis.Prediction.Proton.Exchangeable;

/// <summary>
/// Shift ranges of exchangeable protons per class and solvent (CDCl3 / DMSO-d6 / acetone-d6 / CD3CN / C6D6).
/// </summary>
/// <remarks>
/// Common practice, from memory of the 1H charts of Pretsch, Bühlmann &amp; Badertscher, Structure Determination of
/// Organic Compounds, Springer 2009, widened to cover concentration, water content and temperature. Anchors read in
/// published tables: ethanol OH 1.32 (CDCl3), 4.63 (DMSO-d6); methanol OH 1.09 and 4.01 (Gottlieb, Kotlyar &amp;
/// Nudelman, J. Org. Chem. 1997, 62, 7512; Fulmer et al., Organometallics 2010, 29, 2176). Abraham et al., Magn.
/// Reson. Chem. 2006, 44, 491 (abstract read) measured DMSO − CDCl3 solvent shifts of labile protons up to +4.6 ppm —
/// hence separate columns. In CD3OD and D2O these protons normally exchange with the solvent and are not seen.
/// </remarks>
internal static class ExchangeableRanges
{
    private static readonly SolventRanges Alcohol = new(new(0.6, 5.6, 1.9), new(3.6, 6.6, 4.6), new(2.7, 5.6, 3.8), new(1.9, 4.2, 2.9), new(0.2, 4.8, 1.2));
    private static readonly SolventRanges Phenol = new(new(3.8, 8.5, 5.3), new(8.0, 10.9, 9.4), new(7.3, 9.6, 8.3), new(6.2, 8.2, 7.0), new(3.5, 7.5, 4.6));
    private static readonly SolventRanges ChelatedOxygen = SolventRanges.Everywhere(9.5, 17.5, 12.0);
    private static readonly SolventRanges Carboxylic = new(new(8.5, 14.0, 11.0), new(10.5, 14.2, 12.5), new(9.5, 13.5, 11.0), new(8.5, 13.0, 10.0), new(8.5, 14.0, 11.5));
    private static readonly SolventRanges Oxime = new(new(6.5, 11.0, 8.5), new(8.3, 12.2, 10.9), new(8.5, 11.5, 10.0), new(7.5, 10.5, 9.0), new(6.0, 10.5, 8.0));
    private static readonly SolventRanges Boronic = new(new(4.0, 7.5, 5.0), new(6.8, 8.8, 8.0), new(6.5, 8.0, 7.2), new(5.5, 7.5, 6.3), new(3.0, 7.0, 4.5));
    private static readonly SolventRanges OtherOxygen = SolventRanges.Everywhere(1.0, 14.0, 6.0);
    private static readonly SolventRanges Amine = new(new(0.4, 3.6, 1.5), new(0.8, 4.2, 2.0), new(0.8, 3.8, 2.0), new(0.5, 3.4, 1.6), new(0.0, 3.0, 0.8));
    private static readonly SolventRanges ArylAmine = new(new(2.8, 6.3, 3.8), new(4.2, 7.5, 5.2), new(3.8, 6.6, 4.6), new(3.6, 6.3, 4.3), new(2.2, 5.5, 3.0));
    private static readonly SolventRanges DiarylAmine = new(new(4.8, 7.2, 5.7), new(7.0, 9.9, 8.2), new(6.5, 8.8, 7.5), new(5.8, 7.8, 6.6), new(4.3, 6.5, 5.0));
    private static readonly SolventRanges HeteroarylAmine = new(new(3.8, 7.2, 4.7), new(5.0, 8.2, 6.4), new(4.8, 7.5, 5.8), new(4.5, 7.0, 5.3), new(3.0, 6.5, 4.0));
    private static readonly SolventRanges ChelatedNitrogen = new(new(5.3, 12.5, 8.0), new(6.0, 12.5, 8.5), new(5.8, 12.5, 8.3), new(5.5, 12.5, 8.0), new(5.0, 12.5, 8.0));
    private static readonly SolventRanges Ammonium = new(new(6.5, 12.5, 9.0), new(7.0, 11.8, 8.5), new(7.0, 12.0, 9.0), new(6.0, 11.0, 8.0), new(6.0, 12.5, 9.0));
    private static readonly SolventRanges AromaticCation = SolventRanges.Everywhere(9.5, 17.5, 13.0);
    private static readonly SolventRanges Amide = new(new(5.0, 8.8, 6.2), new(7.2, 9.3, 8.1), new(6.6, 8.9, 7.5), new(6.0, 8.2, 6.8), new(4.5, 8.0, 5.8));
    private static readonly SolventRanges Anilide = new(new(6.6, 12.0, 7.6), new(9.0, 12.8, 10.0), new(8.6, 11.0, 9.3), new(7.8, 10.2, 8.6), new(6.3, 9.5, 7.2));
    private static readonly SolventRanges PrimaryAmide = new(new(5.0, 7.7, 6.0), new(6.6, 8.4, 7.4), new(6.0, 7.9, 6.9), new(5.4, 7.3, 6.2), new(4.3, 6.6, 5.3));
    private static readonly SolventRanges Carbamate = new(new(4.2, 6.2, 4.8), new(6.2, 7.9, 6.9), new(5.4, 7.0, 6.1), new(5.0, 6.4, 5.6), new(3.8, 5.8, 4.5));
    private static readonly SolventRanges ArylCarbamate = new(new(6.0, 7.6, 6.6), new(8.8, 10.2, 9.4), new(8.2, 9.2, 8.6), new(7.2, 8.3, 7.7), new(5.8, 7.0, 6.3));
    private static readonly SolventRanges Urea = new(new(4.0, 7.0, 5.0), new(5.3, 7.0, 6.1), new(5.0, 6.8, 5.7), new(4.6, 6.4, 5.3), new(3.8, 6.5, 4.6));
    private static readonly SolventRanges ArylUrea = new(new(6.0, 8.8, 7.0), new(8.0, 9.8, 8.7), new(7.6, 9.0, 8.2), new(6.8, 8.2, 7.4), new(5.5, 8.0, 6.5));
    private static readonly SolventRanges Imide = new(new(7.4, 10.0, 8.4), new(10.0, 12.8, 11.2), new(9.5, 11.2, 10.2), new(8.6, 10.0, 9.2), new(7.0, 9.5, 8.0));
    private static readonly SolventRanges Sulfonamide = new(new(4.0, 6.2, 4.7), new(6.6, 8.2, 7.4), new(5.8, 7.2, 6.5), new(5.0, 6.4, 5.6), new(3.6, 5.6, 4.3));
    private static readonly SolventRanges Sulfonanilide = new(new(5.8, 8.2, 6.8), new(9.0, 11.8, 10.2), new(8.2, 9.8, 8.9), new(7.4, 8.6, 7.9), new(5.6, 7.8, 6.5));
    private static readonly SolventRanges Hydrazide = new(new(6.5, 10.5, 8.0), new(8.5, 12.2, 10.0), new(8.0, 11.5, 9.5), new(7.5, 10.5, 8.8), new(6.0, 10.0, 7.5));
    private static readonly SolventRanges Hydrazine = SolventRanges.Everywhere(2.5, 11.0, 6.0);
    private static readonly SolventRanges Pyrrole = new(new(7.5, 10.6, 8.2), new(10.1, 12.3, 11.0), new(9.6, 11.2, 10.2), new(8.7, 10.2, 9.2), new(6.3, 8.8, 7.0));
    private static readonly SolventRanges Azole = new(new(8.0, 15.5, 11.0), new(11.3, 16.8, 12.8), new(10.3, 14.5, 12.0), new(9.5, 13.5, 11.0), new(8.0, 15.0, 11.0));
    private static readonly SolventRanges AromaticLactam = new(new(8.5, 14.0, 11.5), new(9.8, 13.0, 11.3), new(9.5, 12.5, 10.8), new(8.8, 12.0, 10.0), new(8.5, 14.0, 11.0));
    private static readonly SolventRanges Amidine = SolventRanges.Everywhere(3.0, 12.0, 6.5);
    private static readonly SolventRanges Thioamide = new(new(6.5, 10.8, 8.0), new(7.3, 12.0, 9.6), new(7.0, 11.0, 9.0), new(6.5, 10.5, 8.5), new(6.0, 10.5, 8.0));
    private static readonly SolventRanges AlkylThiol = new(new(0.9, 2.3, 1.4), new(1.7, 3.2, 2.3), new(1.2, 2.8, 1.9), new(1.2, 2.6, 1.7), new(0.5, 2.0, 1.1));
    private static readonly SolventRanges ArylThiol = new(new(2.8, 4.4, 3.4), new(3.3, 6.2, 5.3), new(3.5, 5.6, 4.5), new(3.3, 5.0, 4.0), new(2.3, 4.0, 3.0));
    private static readonly SolventRanges Unknown = SolventRanges.Everywhere(0.0, 16.0, 6.0);

    /// <summary>The ranges of <paramref name="kind"/> (water is handled from the residual-solvent table).</summary>
    public static SolventRanges Of(ExchangeableKind kind) => kind switch
    {
        ExchangeableKind.AlcoholOH => Alcohol,
        ExchangeableKind.PhenolOH => Phenol,
        ExchangeableKind.ChelatedOH => ChelatedOxygen,
        ExchangeableKind.CarboxylicOH => Carboxylic,
        ExchangeableKind.OximeOH => Oxime,
        ExchangeableKind.BoronicOH => Boronic,
        ExchangeableKind.OtherOH => OtherOxygen,
        ExchangeableKind.AmineNH => Amine,
        ExchangeableKind.ArylAmineNH => ArylAmine,
        ExchangeableKind.DiarylAmineNH => DiarylAmine,
        ExchangeableKind.HeteroarylAmineNH => HeteroarylAmine,
        ExchangeableKind.ChelatedNH => ChelatedNitrogen,
        ExchangeableKind.AmmoniumNH => Ammonium,
        ExchangeableKind.AromaticCationNH => AromaticCation,
        ExchangeableKind.AmideNH => Amide,
        ExchangeableKind.AnilideNH => Anilide,
        ExchangeableKind.PrimaryAmideNH => PrimaryAmide,
        ExchangeableKind.CarbamateNH => Carbamate,
        ExchangeableKind.ArylCarbamateNH => ArylCarbamate,
        ExchangeableKind.UreaNH => Urea,
        ExchangeableKind.ArylUreaNH => ArylUrea,
        ExchangeableKind.ImideNH => Imide,
        ExchangeableKind.SulfonamideNH => Sulfonamide,
        ExchangeableKind.SulfonanilideNH => Sulfonanilide,
        ExchangeableKind.HydrazideNH => Hydrazide,
        ExchangeableKind.HydrazineNH => Hydrazine,
        ExchangeableKind.PyrroleNH => Pyrrole,
        ExchangeableKind.AzoleNH => Azole,
        ExchangeableKind.AromaticLactamNH => AromaticLactam,
        ExchangeableKind.AmidineNH => Amidine,
        ExchangeableKind.ThioamideNH => Thioamide,
        ExchangeableKind.AlkylThiol => AlkylThiol,
        ExchangeableKind.ArylThiol => ArylThiol,
        _ => Unknown,
    };
}
