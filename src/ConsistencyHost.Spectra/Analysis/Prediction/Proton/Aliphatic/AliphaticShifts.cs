namespace ConsistencyHost.Spectra.Analysis.Prediction.Proton.Aliphatic;

/// <summary>
/// 1H window for the hydrogens of an sp3 carbon: tabulated special cases first (CHX3/CH2X2, geminal heteroatoms,
/// CH3 on a functional group), otherwise base + α/β/γ increments + ring correction (Beauchamp–Marquez additivity).
/// </summary>
/// <remarks>
/// Half-width: 0.25 (CH3), 0.30 (CH2), 0.35 (CH) for one substituent — the spread of the method's worked examples
/// (Beauchamp &amp; Marquez 1997: allyl ethyl ether within 0.1; Shoolery-type estimates within 0.2, e.g. benzyl
/// acetate 5.21 vs 5.10, 1,1-disubstituted CH 4.93 vs 5.11) with the tail covered — plus 0.10 for each further α
/// group (additivity degrades with crowding), 0.05 for each β/γ group, and the extra width of approximate rows.
/// </remarks>
internal static class AliphaticShifts
{
    /// <summary>The window for the hydrogens on saturated carbon <paramref name="carbon"/>.</summary>
    public static ShiftPrediction Predict(PredictionContext context, int carbon, string? solvent) =>
        AliphaticSpecialCases.Predict(context, carbon, solvent) ?? ByIncrements(context, carbon, solvent);

    private static ShiftPrediction ByIncrements(PredictionContext context, int carbon, string? solvent)
    {
        var hydrogens = context.Molecule.Atoms[carbon].HydrogenCount;
        var estimate = new ProtonEstimate().Start(AlkylIncrements.BaseFor(hydrogens), BaseLabel(hydrogens));
        estimate.Widen(hydrogens >= 3 ? 0.25 : hydrogens == 2 ? 0.30 : 0.35, "additivity error");
        var tally = new IncrementTally(context, estimate);
        SubstituentWalk.Walk(context, carbon, ref tally, static (int level, int carrier, int atom, ref IncrementTally t) => t.Apply(level, carrier, atom));
        tally.DampCrowdedAlpha();
        if (tally.AlphaGroups > 1) estimate.Widen(0.10 * (tally.AlphaGroups - 1), tally.AlphaGroups, "α groups");
        if (tally.FurtherGroups > 0) estimate.Widen(0.05 * Math.Min(3, tally.FurtherGroups), tally.FurtherGroups, "β/γ groups");
        if (tally.ApproximateRows > 0) estimate.Widen(tally.ApproximateRows, "approximate rows");
        ApplyRing(context, carbon, estimate);
        if (NearbyRings.HasAromaticWithin(context, carbon, 4, skipAlpha: true))
        {
            estimate.Stretch(0.15, 0, "aromatic ring within 4 bonds: ring-current shielding up to −0.15");
        }

        SolventStretch.Apply(estimate, solvent, tally.PolarAlpha);
        return estimate.Finish(ShiftBasis.Increments);
    }

    private static void ApplyRing(PredictionContext context, int carbon, ProtonEstimate estimate)
    {
        var (size, ringOxygen, rings) = RingFacts.SmallestRing(context, carbon);
        var (delta, width) = RingCorrections.ForRing(size, ringOxygen);
        if (size == 0)
        {
            return;
        }

        estimate.Add(delta, size < RingLabels.Length ? RingLabels[size] : $"{size}-membered ring");
        estimate.Widen(width, "ring (axial/equatorial, parent spread)");
        if (size >= 6 && NearbyRings.IsNextToRingAmideNitrogen(context, carbon))
        {
            // N-acyl piperidines and morpholines: slow amide rotation and axial/equatorial split spread NCH2 over 2.6–4.6.
            estimate.Widen(0.45, "N-acyl ring CH2 (rotamers)");
        }

        if (rings > 1) estimate.Widen(0.1, "fused or bridged");
    }

    private static string BaseLabel(int hydrogens) => hydrogens switch
    {
        >= 3 => "base CH3 (Beauchamp–Marquez)",
        2 => "base CH2 (Beauchamp–Marquez)",
        _ => "base CH (Beauchamp–Marquez)",
    };

    // "3-membered ring" … "12-membered ring", written once instead of per window.
    private static readonly string[] RingLabels = [.. Enumerable.Range(0, 13).Select(size => $"{size}-membered ring")];
}
