using ConsistencyHost.Chemistry.Perception.Symmetry;
using ConsistencyHost.Spectra.Analysis.Prediction.Carbon;
using ConsistencyHost.Spectra.Analysis.Prediction.Proton;
using ConsistencyHost.Spectra.Model;

namespace ConsistencyHost.Spectra.Analysis.Prediction;

/// <summary>
/// The predicted shift window of every hydrogen class and every 13C carbon class of a structure in one solvent,
/// in the order of <see cref="NmrEquivalence.HydrogenClasses"/> and <see cref="NmrEquivalence.CarbonClasses13C"/>.
/// One window per class: the members are equivalent, so the first member stands for all. Each nucleus is
/// predicted on first use (thread-safe, once): an entry with only a 1H list never pays for the 13C windows.
/// </summary>
public sealed class ClassShifts
{
    private readonly Lazy<ShiftPrediction[]> _hydrogen;
    private readonly Lazy<ShiftPrediction[]> _carbon;

    private ClassShifts(string? solvent, Lazy<ShiftPrediction[]> hydrogen, Lazy<ShiftPrediction[]> carbon)
    {
        Solvent = solvent;
        _hydrogen = hydrogen;
        _carbon = carbon;
    }

    /// <summary>The canonical solvent the windows are for (null when not stated: exchangeable windows are widest).</summary>
    public string? Solvent { get; }

    /// <summary>The 1H window of each hydrogen class.</summary>
    public IReadOnlyList<ShiftPrediction> Hydrogen => _hydrogen.Value;

    /// <summary>The 13C window of each carbon class.</summary>
    public IReadOnlyList<ShiftPrediction> Carbon => _carbon.Value;

    /// <summary>Windows for the classes of <paramref name="equivalence"/> in <paramref name="solvent"/> (any spelling; normalised here).</summary>
    public static ClassShifts Of(PredictionContext context, NmrEquivalence equivalence, string? solvent)
    {
        ArgumentNullException.ThrowIfNull(context);
        ArgumentNullException.ThrowIfNull(equivalence);
        var canonical = SolventNames.Normalise(solvent);
        return new ClassShifts(
            canonical,
            new Lazy<ShiftPrediction[]>(() => PredictHydrogen(context, equivalence, canonical), LazyThreadSafetyMode.ExecutionAndPublication),
            new Lazy<ShiftPrediction[]>(() => PredictCarbon(context, equivalence, canonical), LazyThreadSafetyMode.ExecutionAndPublication));
    }

    private static ShiftPrediction[] PredictHydrogen(PredictionContext context, NmrEquivalence equivalence, string? solvent)
    {
        var hydrogen = new ShiftPrediction[equivalence.HydrogenClasses.Length];
        for (var c = 0; c < hydrogen.Length; c++)
        {
            hydrogen[c] = ProtonShifts.Predict(context, equivalence.HydrogenClasses[c].ParentAtoms[0], solvent);
        }

        return hydrogen;
    }

    private static ShiftPrediction[] PredictCarbon(PredictionContext context, NmrEquivalence equivalence, string? solvent)
    {
        var carbon = new ShiftPrediction[equivalence.CarbonClasses13C.Length];
        for (var c = 0; c < carbon.Length; c++)
        {
            carbon[c] = CarbonShifts.Predict(context, equivalence.CarbonClasses13C[c][0], solvent);
        }

        return carbon;
    }
}
