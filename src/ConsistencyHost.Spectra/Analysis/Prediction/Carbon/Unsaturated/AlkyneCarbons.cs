using ConsistencyHost.Spectra.Analysis.Prediction.Carbon.Core;
using ConsistencyHost.Spectra.Analysis.Prediction.Carbon.Groups;

namespace ConsistencyHost.Spectra.Analysis.Prediction.Carbon.Unsaturated;

/// <summary>Alkyne carbons: δ = 71.9 + Σ Z(own side) + Σ Z(other side).</summary>
/// <remarks>
/// Alkyl terms from memory (Pretsch et al. 2009, after Dorman, Jautelat and Roberts, J. Org. Chem. 1971, 36, 2757):
/// own α 6.9, β 4.8, γ −0.1; other α′ −5.7, β′ 2.3, γ′ −1.3 (1-hexyne 68.3/84.5). Groups (own, other) read off
/// parents from memory: phenylacetylene 83.7/77.2, 1-trimethylsilyl-1-hexyne 84.5 (C–Si)/107.5, ethyl
/// phenylpropiolate 80.6/86.1, 4-phenylbut-3-yn-2-one 88.3/90.2, ethoxyacetylene 89.5/23, 1-bromo- and
/// 1-iodoalkynes (C–Br 38, C–I −5 to 8). Other groups get the environment range.
/// </remarks>
internal static class AlkyneCarbons
{
    private const double Base = 71.9;
    private static readonly double[] OwnAlkyl = [0, 6.9, 4.8, -0.1];
    private static readonly double[] OtherAlkyl = [0, -5.7, 2.3, -1.3];
    private static readonly string[] OwnLabels = ["", "α C", "β C", "γ C"];
    private static readonly string[] OtherLabels = ["", "α′ C", "β′ C", "γ′ C"];
    private static readonly string[] OwnGroupLabels = GroupNames.Prefixed("gem");
    private static readonly string[] AcrossGroupLabels = GroupNames.Prefixed("across");

    /// <summary>The window of alkyne carbon <paramref name="carbon"/> triple-bonded to carbon <paramref name="partner"/>.</summary>
    public static ShiftPrediction Predict(PredictionContext context, int carbon, int partner)
    {
        var estimate = new CarbonEstimate().Base("base C≡C", Base);
        var spread = AddSide(context, carbon, partner, estimate, own: true) + AddSide(context, partner, carbon, estimate, own: false);
        estimate.Widen(2.5 + spread);
        return estimate.Build(ShiftBasis.Increments, "substituents (increment error)", context.Molecule.Degree(carbon) + context.Molecule.Degree(partner) - 2);
    }

    private static double AddSide(PredictionContext context, int atom, int across, CarbonEstimate estimate, bool own)
    {
        var m = context.Molecule;
        var spread = 0.0;
        foreach (var x in m.Neighbours(atom))
        {
            if (x == across)
            {
                continue;
            }

            var group = GroupClassifier.Classify(context, atom, x);
            if (group == Group.Alkyl)
            {
                var (beta, gamma, hetero) = ChainWalk.Count(context, atom, x);
                var terms = own ? OwnAlkyl : OtherAlkyl;
                var labels = own ? OwnLabels : OtherLabels;
                estimate.Add(labels[1], terms[1]);
                for (var i = 0; i < beta; i++)
                {
                    estimate.Add(labels[2], terms[2]);
                }

                for (var i = 0; i < gamma; i++)
                {
                    estimate.Add(labels[3], terms[3]);
                }

                spread += 0.5 + 1.5 * hetero;
                continue;
            }

            var (value, uncertainty) = GroupTerm(group, own);
            estimate.Add(own ? OwnGroupLabels[(int)group] : AcrossGroupLabels[(int)group], value);
            spread += uncertainty;
        }

        return spread;
    }

    private static (double Value, double Spread) GroupTerm(Group group, bool own) => group switch
    {
        Group.Aryl => own ? (11.8, 2.5) : (5.3, 2.5),
        Group.Vinyl => own ? (9.7, 3.0) : (6.0, 3.0),
        Group.Alkynyl => own ? (-4.0, 4.0) : (-6.0, 4.0),
        Group.Silyl => own ? (17.3, 2.5) : (24.0, 2.5),
        Group.Ester or Group.CarboxylicAcid or Group.Amide => own ? (3.4, 3.0) : (2.4, 3.0),
        Group.Acyl or Group.Formyl => own ? (11.1, 3.5) : (6.5, 3.5),
        Group.Alkoxy or Group.Aryloxy => own ? (17.6, 6.0) : (-49.0, 8.0),
        Group.Amido or Group.DialkylAmido or Group.Sulfonamido or Group.AzoleNitrogen => own ? (5.5, 6.0) : (-12.4, 6.0),
        Group.Bromo => own ? (-29.2, 5.0) : (-3.3, 4.0),
        Group.Iodo => own ? (-71.0, 7.0) : (10.5, 5.0),
        _ => (0.0, 15.0),
    };
}
