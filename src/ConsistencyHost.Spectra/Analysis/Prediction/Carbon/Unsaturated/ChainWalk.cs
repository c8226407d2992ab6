using ConsistencyHost.Spectra.Analysis.Prediction.Carbon.Core;

namespace ConsistencyHost.Spectra.Analysis.Prediction.Carbon.Unsaturated;

/// <summary>Counts the sp3 carbons of an alkyl substituent at its β and γ positions (from the π carbon).</summary>
internal static class ChainWalk
{
    /// <summary>
    /// For the alkyl carbon <paramref name="alpha"/> on π carbon <paramref name="pi"/>: how many sp3 carbons lie one
    /// and two bonds further out, and how many heteroatoms hang on the α carbon.
    /// </summary>
    public static (int Beta, int Gamma, int BetaHetero) Count(PredictionContext context, int pi, int alpha)
    {
        var (beta, gamma, hetero, _) = CountWithBranching(context, pi, alpha);
        return (beta, gamma, hetero);
    }

    /// <summary>As <see cref="Count"/>, plus the largest number of alkyl substituents on any one β carbon.</summary>
    public static (int Beta, int Gamma, int BetaHetero, int MostOnOneBeta) CountWithBranching(PredictionContext context, int pi, int alpha)
    {
        var m = context.Molecule;
        int beta = 0, gamma = 0, hetero = 0, most = 0;
        foreach (var b in m.Neighbours(alpha))
        {
            if (b == pi)
            {
                continue;
            }

            if (!Topology.IsSp3Carbon(context, b))
            {
                hetero += m.Atoms[b].AtomicNumber != Topology.Carbon ? 1 : 0;
                continue;
            }

            beta++;
            var onThisBeta = 0;
            foreach (var g in m.Neighbours(b))
            {
                if (g != alpha && g != pi && Topology.IsSp3Carbon(context, g))
                {
                    onThisBeta++;
                }
            }

            gamma += onThisBeta;
            most = Math.Max(most, onThisBeta);
        }

        return (beta, gamma, hetero, most);
    }
}
