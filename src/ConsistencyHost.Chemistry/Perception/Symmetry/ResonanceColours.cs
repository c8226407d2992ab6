using ConsistencyHost.Chemistry.Model;
using ConsistencyHost.Chemistry.Perception.Rings;

namespace ConsistencyHost.Chemistry.Perception.Symmetry;

/// <summary>Colours that do not depend on which resonance form was drawn: a charge written on one atom of a set
/// of resonance-equivalent atoms is spread over the set, and the bonds to them get one delocalised colour.</summary>
/// <remarks>
/// Two rules (common practice: the charge of these ions is delocalised, so their atoms are equivalent):
/// (1) charge-shift pairs around a centre X — neighbours of X of the same element, isotope, H count and degree
/// whose bond order minus charge is the same, bonded to X by orders k and k+1 (perchlorate, sulfonate,
/// carboxylate, nitro and phosphate O; the two N of an amidinium or guanidinium); (2) a charged carbon in an
/// aromatic system (cyclopentadienide `[C-]`, tropylium): every carbon of that aromatic system carries the
/// system's carbon charge. The graph keeps the written charge for formula and mass; only symmetry uses these.
/// </remarks>
internal static class ResonanceColours
{
    /// <summary>Charge code for an atom of a delocalised set, outside the range of real charges (-15..15).</summary>
    private const int DelocalisedBase = 40;

    public const int DelocalisedBond = 5;

    /// <summary>Per atom the charge to colour with, and per bond index true when the bond is delocalised.</summary>
    public static (int[] Charge, bool[] DelocalisedBonds) Of(Molecule m, Aromaticity aromaticity)
    {
        var charge = new int[m.AtomCount];
        for (var v = 0; v < charge.Length; v++)
        {
            charge[v] = m.Atoms[v].Charge;
        }

        var delocalised = new bool[m.Bonds.Length];
        for (var x = 0; x < m.AtomCount; x++)
        {
            ChargeShiftGroups(m, x, charge, delocalised);
        }

        AromaticCarbonCharges(m, aromaticity, charge);
        return (charge, delocalised);
    }

    private static void ChargeShiftGroups(Molecule m, int x, int[] charge, bool[] delocalised)
    {
        var n = m.Neighbours(x).ToArray();
        var bonds = m.BondsOf(x).ToArray();
        if (n.Length < 2)
        {
            return;
        }

        var groups = new Dictionary<(int, int, int, int, int), List<int>>();
        for (var k = 0; k < n.Length; k++)
        {
            var y = m.Atoms[n[k]];
            var order = m.Bonds[bonds[k]].Order;
            if (order is not (1 or 2) || m.Bonds[bonds[k]].IsAromatic)
            {
                continue;
            }

            var key = (y.AtomicNumber, y.Isotope, y.HydrogenCount, m.Degree(n[k]), order - y.Charge);
            if (!groups.TryGetValue(key, out var list))
            {
                groups[key] = list = [];
            }

            list.Add(k);
        }

        foreach (var list in groups.Values)
        {
            var orders = list.Select(k => m.Bonds[bonds[k]].Order).Distinct().Count();
            if (list.Count < 2 || orders < 2)
            {
                continue;
            }

            var total = list.Sum(k => m.Atoms[n[k]].Charge);
            foreach (var k in list)
            {
                charge[n[k]] = DelocalisedBase + ((total + 4) * 8) + Math.Min(list.Count, 7);
                delocalised[bonds[k]] = true;
            }
        }
    }

    private static void AromaticCarbonCharges(Molecule m, Aromaticity aromaticity, int[] charge)
    {
        var seen = new bool[m.AtomCount];
        for (var start = 0; start < m.AtomCount; start++)
        {
            if (seen[start] || !aromaticity.AromaticAtoms[start])
            {
                continue;
            }

            var system = new List<int>();
            var stack = new Stack<int>();
            stack.Push(start);
            seen[start] = true;
            while (stack.Count > 0)
            {
                var v = stack.Pop();
                system.Add(v);
                foreach (var b in m.BondsOf(v))
                {
                    var w = m.Bonds[b].Other(v);
                    if (aromaticity.AromaticBonds[b] && !seen[w])
                    {
                        seen[w] = true;
                        stack.Push(w);
                    }
                }
            }

            var carbons = system.Where(v => m.Atoms[v].AtomicNumber == 6).ToList();
            if (!carbons.Exists(v => m.Atoms[v].Charge != 0))
            {
                continue;
            }

            var total = carbons.Sum(v => m.Atoms[v].Charge);
            foreach (var v in carbons)
            {
                charge[v] = DelocalisedBase + 100 + total;
            }
        }
    }
}
