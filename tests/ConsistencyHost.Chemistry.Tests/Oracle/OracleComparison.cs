using System.Globalization;

namespace ConsistencyHost.Chemistry.Tests.Oracle;

/// <summary>How our classes relate to RDKit's for one molecule.</summary>
internal enum OracleClassVerdict
{
    Same,
    /// <summary>Ours split an RDKit class: RDKit's refinement merged atoms no automorphism exchanges.</summary>
    OursFiner,
    /// <summary>RDKit split one of our orbits: ours would be wrong (an orbit is proven by an automorphism).</summary>
    TheirsFiner,
    /// <summary>Different atom counts or crossing partitions.</summary>
    Different,
}

internal sealed record OracleComparison(string Name, string Detail, bool FormulaOk, bool MassOk, OracleClassVerdict Classes);

/// <summary>Accumulates comparisons and writes the disagreement list.</summary>
internal sealed class OracleTally
{
    private readonly List<OracleComparison> all = [];

    public int FormulaMismatches => all.Count(c => !c.FormulaOk);

    public int MassMismatches => all.Count(c => !c.MassOk);

    public int OurBugs => all.Count(c => c.Classes is OracleClassVerdict.TheirsFiner or OracleClassVerdict.Different);

    public double ClassAgreement => all.Count == 0 ? 0 : all.Count(c => c.Classes == OracleClassVerdict.Same) / (double)all.Count;

    public void Add(OracleComparison c) => all.Add(c);

    public IEnumerable<string> Report()
    {
        yield return string.Create(CultureInfo.InvariantCulture,
            $"molecules RDKit parsed: {all.Count}; formula agree {all.Count - FormulaMismatches}; mass agree {all.Count - MassMismatches}; classes identical {ClassAgreement:P2}");
        foreach (var c in all.Where(c => !c.FormulaOk || !c.MassOk || c.Classes != OracleClassVerdict.Same || c.Detail.Contains("; mass:", StringComparison.Ordinal)))
        {
            var reason = c.Classes switch
            {
                OracleClassVerdict.OursFiner => "classes: RDKit refinement merges atoms that no automorphism exchanges (ours proven finer)",
                OracleClassVerdict.TheirsFiner => "classes: RDKit finer than our orbits (our bug)",
                OracleClassVerdict.Different => "classes: partitions differ (our bug or a different graph)",
                _ => "classes agree",
            };
            yield return $"{c.Name}: formula {(c.FormulaOk ? "ok" : "DIFF")}, mass {(c.MassOk ? "ok" : "DIFF")}; {reason}; {c.Detail}";
        }
    }
}

/// <summary>Compares two partitions given as per-atom labels.</summary>
internal static class PartitionComparison
{
    public static OracleClassVerdict Compare(IReadOnlyList<int> ours, IReadOnlyList<int> theirs)
    {
        if (ours.Count != theirs.Count)
        {
            return OracleClassVerdict.Different;
        }

        var oursRefinesTheirs = Refines(ours, theirs);
        var theirsRefinesOurs = Refines(theirs, ours);
        return (oursRefinesTheirs, theirsRefinesOurs) switch
        {
            (true, true) => OracleClassVerdict.Same,
            (true, false) => OracleClassVerdict.OursFiner,
            (false, true) => OracleClassVerdict.TheirsFiner,
            _ => OracleClassVerdict.Different,
        };
    }

    /// <summary>True when every class of <paramref name="fine"/> lies inside one class of <paramref name="coarse"/>.</summary>
    private static bool Refines(IReadOnlyList<int> fine, IReadOnlyList<int> coarse)
    {
        var map = new Dictionary<int, int>();
        for (var i = 0; i < fine.Count; i++)
        {
            if (map.TryGetValue(fine[i], out var c) && c != coarse[i])
            {
                return false;
            }

            map[fine[i]] = coarse[i];
        }

        return true;
    }
}
