using ConsistencyHost.Chemistry.Perception.Symmetry;
using ConsistencyHost.Spectra.Analysis.Prediction.Carbon;
using ConsistencyHost.Spectra.Analysis.Prediction.Proton;
using ConsistencyHost.Spectra.Model;

namespace ConsistencyHost.Spectra.Analysis.Prediction;

/// <summary>
/// The predicted shift window of every hydrogen class and every 13C carbon class of a structure in one solvent,
/// in the order of <see cref="NmrEquivalence.HydrogenClasses"/> and <see cref="NmrEquivalence.CarbonClasses13C"/>.
/// One window per class: the members are equivalent, so the first member stands for all.
/// </summary>
public sealed class ClassShifts
{
    private ClassShifts(string? solvent, IReadOnlyList<ShiftPrediction> hydrogen, IReadOnlyList<ShiftPrediction> carbon)
    {
        Solvent = solvent;
        Hydrogen = hydrogen;
        Carbon = carbon;
    }

    /// <summary>The canonical solvent the windows are for (null when not stated: exchangeable windows are widest).</summary>
    public string? Solvent { get; }

    /// <summary>The 1H window of each hydrogen class.</summary>
    public IReadOnlyList<ShiftPrediction> Hydrogen { get; }

    /// <summary>The 13C window of each carbon class.</summary>
    public IReadOnlyList<ShiftPrediction> Carbon { get; }

    /// <summary>Windows for the classes of <paramref name="equivalence"/> in <paramref name="solvent"/> (any spelling; normalised here).</summary>
    public static ClassShifts Of(PredictionContext context, NmrEquivalence equivalence, string? solvent)
    {
        ArgumentNullException.ThrowIfNull(context);
        ArgumentNullException.ThrowIfNull(equivalence);
        var canonical = SolventNames.Normalise(solvent);
        var hydrogen = new ShiftPrediction[equivalence.HydrogenClasses.Length];
        for (var c = 0; c < hydrogen.Length; c++)
        {
            hydrogen[c] = ProtonShifts.Predict(context, equivalence.HydrogenClasses[c].ParentAtoms[0], canonical);
        }

        var carbon = new ShiftPrediction[equivalence.CarbonClasses13C.Length];
        for (var c = 0; c < carbon.Length; c++)
        {
            carbon[c] = CarbonShifts.Predict(context, equivalence.CarbonClasses13C[c][0], canonical);
        }

        return new ClassShifts(canonical, hydrogen, carbon);
    }
}
