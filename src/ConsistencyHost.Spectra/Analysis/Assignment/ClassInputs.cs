using System.Collections.Immutable;
using ConsistencyHost.Chemistry.Perception.Symmetry;

namespace ConsistencyHost.Spectra.Analysis.Assignment;

/// <summary>Turns the structure's stereo-aware hydrogen classes into the solver's class inputs.</summary>
/// <remarks>
/// Typical partners: vicinal (3J) protons of other non-exchangeable classes plus a diastereotopic geminal
/// partner (2J). Maximum: those plus exchangeable vicinal protons (O–H/N–H coupling is seen in dry DMSO-d6),
/// long-range 4J partners, protons of the class itself when they are vicinal or long-range to each other
/// (magnetically inequivalent AA'XX' systems), and 19F/31P neighbours within three bonds. Common practice
/// (first-order n+1 rule; nmr-methods notes §3.4).
/// </remarks>
public static class ClassInputs
{
    /// <summary>One input per hydrogen class, in class order.</summary>
    public static IReadOnlyList<ClassInput> From(NmrEquivalence equivalence)
    {
        ArgumentNullException.ThrowIfNull(equivalence);
        var classes = equivalence.HydrogenClasses;
        var inputs = new ClassInput[classes.Length];
        for (var c = 0; c < classes.Length; c++)
        {
            var group = classes[c];
            var typical = SizeOf(classes, group.Vicinal3J, c, exchangeable: false) + SizeOf(classes, group.Geminal2J, c, exchangeable: null);
            var extra = SizeOf(classes, group.Vicinal3J, c, exchangeable: true)
                        + SizeOf(classes, group.LongRange4J, c, exchangeable: null)
                        + SelfPartners(group)
                        + group.HeteronuclearNeighbours.Length;
            inputs[c] = new ClassInput(group.ParentAtoms.Length, group.IsExchangeable, group.IsExchangeable ? 0 : typical, typical + extra, c);
        }

        return inputs;
    }

    /// <summary>
    /// The inputs with each class in <paramref name="splits"/> replaced by its two halves (slow exchange, e.g.
    /// amide rotation): same coupling numbers, half the protons each.
    /// </summary>
    public static IReadOnlyList<ClassInput> Split(IReadOnlyList<ClassInput> inputs, IEnumerable<int> splits)
    {
        var split = splits.ToHashSet();
        var result = new List<ClassInput>(inputs.Count + split.Count);
        foreach (var input in inputs)
        {
            if (split.Contains(input.Source) && input.Size % 2 == 0)
            {
                result.Add(input with { Size = input.Size / 2 });
                result.Add(input with { Size = input.Size / 2 });
            }
            else
            {
                result.Add(input);
            }
        }

        return result;
    }

    private static int SizeOf(ImmutableArray<HydrogenClass> classes, ImmutableArray<int> partners, int self, bool? exchangeable)
    {
        var sum = 0;
        foreach (var p in partners)
        {
            if (p == self) continue;
            if (exchangeable is { } wanted && classes[p].IsExchangeable != wanted) continue;
            sum += classes[p].ParentAtoms.Length;
        }

        return sum;
    }

    private static int SelfPartners(HydrogenClass group) =>
        group.Vicinal3J.Contains(group.Index) || group.LongRange4J.Contains(group.Index) ? group.ParentAtoms.Length - 1 : 0;
}
