using ConsistencyHost.Spectra.Analysis.Prediction.Proton.Substituents;

namespace ConsistencyHost.Spectra.Analysis.Prediction.Proton.Aliphatic;

/// <summary>
/// Finds the α, β and γ substituents of an sp3 carbon: a breadth-first walk through saturated carbons only; every
/// other atom met is a substituent, classified from the carbon that reaches it first and counted once (so a ring
/// oxygen reached from both sides counts at its nearest position).
/// </summary>
internal static class SubstituentWalk
{
    /// <summary>Calls <paramref name="visit"/> with (level 1–3, carrying carbon, substituent atom) for each substituent.</summary>
    public static void Walk<TState>(PredictionContext context, int carbon, ref TState state, Visitor<TState> visit)
    {
        var n = context.Molecule.AtomCount;
        Span<byte> seen = n <= 512 ? stackalloc byte[n] : new byte[n];
        Span<int> frontier = n <= 512 ? stackalloc int[n] : new int[n];
        Span<int> next = n <= 512 ? stackalloc int[n] : new int[n];
        seen[carbon] = 1;
        frontier[0] = carbon;
        var frontierCount = 1;
        for (var level = 1; level <= 3 && frontierCount > 0; level++)
        {
            var nextCount = 0;
            for (var f = 0; f < frontierCount; f++)
            {
                var from = frontier[f];
                foreach (var atom in context.Molecule.Neighbours(from))
                {
                    if (seen[atom] != 0)
                    {
                        continue;
                    }

                    seen[atom] = 1;
                    if (AtomFacts.IsSaturatedCarbon(context, atom))
                    {
                        next[nextCount++] = atom;
                    }
                    else
                    {
                        visit(level, from, atom, ref state);
                    }
                }
            }

            next[..nextCount].CopyTo(frontier);
            frontierCount = nextCount;
        }
    }

    /// <summary>Receives one substituent found by the walk.</summary>
    public delegate void Visitor<TState>(int level, int carrier, int atom, ref TState state);
}
