using ConsistencyHost.Spectra.Analysis.Prediction.Proton.Substituents;

namespace ConsistencyHost.Spectra.Analysis.Prediction.Proton.Aliphatic;

/// <summary>
/// Adds the α/β/γ increment of each substituent the walk finds and counts what widens the window. Several groups on
/// one β or γ carbon (CF3, CCl3) do not add linearly: the first counts in full, the others at half
/// (CF3CH2OH CH2 3.93 against 1.2 + 2.3 + 3 × 0.5 = 5.0 for plain summation; from memory of Pretsch 2009).
/// Several deshielding α groups overshoot too (benzhydrol CH 5.8 against 1.5 + 2.3 + 1.4 + 1.4 = 6.6; Shoolery-type
/// sums are best for CH2 with two groups, as the rule's own statement says): the largest α increment counts in full,
/// the second at 0.85, further ones at 0.7 (PhCH2OH 4.69 against 4.67 observed; from memory of the parents).
/// </summary>
internal struct IncrementTally(PredictionContext context, ProtonEstimate estimate)
{
    private static readonly string[] PositionPrefixes = ["", "α-", "β-", "γ-"];
    private int lastCarrier = -1;
    private double largestAlpha;
    private double secondAlpha;
    private double furtherAlpha;

    /// <summary>Number of α groups with an increment (not plain alkyl).</summary>
    public int AlphaGroups { get; private set; }

    /// <summary>Number of β and γ groups.</summary>
    public int FurtherGroups { get; private set; }

    /// <summary>Extra half-width from approximate rows.</summary>
    public double ApproximateRows { get; private set; }

    /// <summary>True when a polar group (heteroatom, carbonyl, nitrile) is α.</summary>
    public bool PolarAlpha { get; private set; }

    /// <summary>Applies one substituent at <paramref name="level"/> (1 α, 2 β, 3 γ) carried by <paramref name="carrier"/>.</summary>
    public void Apply(int level, int carrier, int atom)
    {
        var kind = SubstituentClassifier.Classify(context, carrier, atom);
        var row = AlkylIncrements.Of(kind);
        var value = row is null ? UnknownIncrement(level) : level switch { 1 => row.Value.Alpha, 2 => row.Value.Beta, _ => row.Value.Gamma };
        if (level > 1 && carrier == lastCarrier)
        {
            value *= 0.5;
        }

        lastCarrier = level > 1 ? carrier : -1;
        Count(level, kind, row);
        if (level == 1 && value > 0)
        {
            Rank(value);
        }

        if (value != 0)
        {
            estimate.Add(value, PositionPrefixes[level], SubstituentLabels.Of(kind));
        }
    }

    private void Count(int level, Substituent kind, AlkylIncrement? row)
    {
        if (row is null)
        {
            ApproximateRows += level == 1 ? 0.5 : 0.15;
            estimate.Note("no increment row for " + PositionPrefixes[level] + SubstituentLabels.Of(kind));
        }
        else if (level == 1)
        {
            ApproximateRows += row.Value.Uncertainty;
        }

        if (level == 1)
        {
            AlphaGroups += 1;
            PolarAlpha |= kind is not (Substituent.Alkenyl or Substituent.Alkynyl or Substituent.Aryl or Substituent.AzinylCarbon
                or Substituent.Silyl or Substituent.Boryl);
        }
        else
        {
            FurtherGroups += 1;
        }
    }

    /// <summary>Applies the damping of the second and further deshielding α increments (after the walk).</summary>
    public readonly void DampCrowdedAlpha()
    {
        var damping = -0.15 * secondAlpha - 0.3 * furtherAlpha;
        if (damping < 0)
        {
            estimate.Add(damping, "crowded α groups (2nd ×0.85, further ×0.7)");
        }
    }

    private void Rank(double value)
    {
        if (value > largestAlpha)
        {
            furtherAlpha += secondAlpha;
            secondAlpha = largestAlpha;
            largestAlpha = value;
        }
        else if (value > secondAlpha)
        {
            furtherAlpha += secondAlpha;
            secondAlpha = value;
        }
        else
        {
            furtherAlpha += value;
        }
    }

    private static double UnknownIncrement(int level) => level == 1 ? 0.8 : 0.1;
}
