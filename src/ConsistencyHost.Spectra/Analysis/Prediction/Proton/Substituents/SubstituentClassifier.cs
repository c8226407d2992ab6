namespace ConsistencyHost.Spectra.Analysis.Prediction.Proton.Substituents;

/// <summary>Names the group that starts at <c>atom</c>, seen from its attachment point <c>from</c>.</summary>
/// <remarks>The classes follow the rows of the increment tables (Beauchamp &amp; Marquez, J. Chem. Educ. 1997, 74,
/// 1483; Pascual, Meier &amp; Simon 1966 as tabulated by Pretsch, Bühlmann &amp; Badertscher 2009; benzene increments
/// of the same book). Priority inside a class follows the strongest effect (a carbonyl neighbour makes an N an amide
/// nitrogen before an aryl neighbour makes it an aniline nitrogen).</remarks>
internal static class SubstituentClassifier
{
    /// <summary>The kind of the group starting at <paramref name="atom"/> attached to <paramref name="from"/>.</summary>
    public static Substituent Classify(PredictionContext context, int from, int atom) =>
        context.Molecule.Atoms[atom].AtomicNumber switch
        {
            6 => CarbonSubstituents.Classify(context, from, atom),
            7 => NitrogenSubstituents.Classify(context, from, atom),
            8 => OxygenSubstituents.Classify(context, from, atom),
            16 or 34 => SulfurSubstituents.Classify(context, from, atom),
            9 => Substituent.Fluoro,
            17 => Substituent.Chloro,
            35 => Substituent.Bromo,
            53 => Substituent.Iodo,
            14 => Substituent.Silyl,
            5 => Substituent.Boryl,
            15 => AtomFacts.DoubleBondsTo(context, atom, 8) + AtomFacts.DoubleBondsTo(context, atom, 16) > 0
                ? Substituent.Phosphoryl : Substituent.Phosphino,
            _ => Substituent.Other,
        };

    /// <summary>True for the plain alkyl kinds that only carry carbon (no increment of their own in the sp3 table).</summary>
    public static bool IsHydrocarbonAlkyl(Substituent kind) => kind is Substituent.Alkyl or Substituent.TertiaryAlkyl;
}
