using System.Collections.Concurrent;
using ConsistencyHost.Spectra.Model;

namespace ConsistencyHost.Spectra.Solvents;

/// <summary>
/// The rows of <see cref="ResidualSolventTable"/> and <see cref="ImpurityTable"/> for one canonical solvent and
/// nucleus, selected once per process: every spectrum in that solvent is matched against the same rows, so the
/// matcher does not filter both tables again for each spectrum.
/// </summary>
internal sealed class SolventRows
{
    private static readonly ConcurrentDictionary<(string Solvent, Nucleus Nucleus), SolventRows?> Cache = new();

    private SolventRows(ResidualSolventLine[] lines, ImpurityRows[] impurities)
    {
        Lines = lines;
        Impurities = impurities;
    }

    /// <summary>The solvent's own residual and water lines for the nucleus.</summary>
    public ResidualSolventLine[] Lines { get; }

    /// <summary>The impurities with at least one group tabulated for this solvent and nucleus, in table order.</summary>
    public ImpurityRows[] Impurities { get; }

    /// <summary>The rows of a canonical solvent name, or null when the residual table has no line for it.</summary>
    public static SolventRows? For(string solvent, Nucleus nucleus) => Cache.GetOrAdd((solvent, nucleus), static key => Build(key.Solvent, key.Nucleus));

    private static SolventRows? Build(string solvent, Nucleus nucleus)
    {
        var lines = ResidualSolventTable.For(solvent, nucleus).ToArray();
        if (lines.Length == 0) return null;
        var impurities = new List<ImpurityRows>();
        foreach (var impurity in ImpurityTable.All)
        {
            var shifts = new List<(ImpurityGroup, ImpurityShift)>();
            foreach (var group in impurity.Groups)
            {
                // The first tabulated cell for this solvent and nucleus, as the matcher always took.
                if (group.Shifts.FirstOrDefault(s => s.Solvent == solvent && s.Nucleus == nucleus) is { } shift) shifts.Add((group, shift));
            }

            if (shifts.Count > 0) impurities.Add(new ImpurityRows(impurity, [.. shifts]));
        }

        return new SolventRows(lines, [.. impurities]);
    }

    /// <summary>One impurity and the shift of each of its groups tabulated for the solvent and nucleus.</summary>
    public sealed record ImpurityRows(Impurity Impurity, (ImpurityGroup Group, ImpurityShift Shift)[] Shifts);
}
