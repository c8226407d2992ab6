using ConsistencyHost.Chemistry.Model;

namespace ConsistencyHost.Chemistry.Smiles;

/// <summary>Chooses '/' or '\' for single bonds next to stereo double bonds so that the written marks encode
/// each configuration (OpenSMILES §3.7); a mark already fixed by a neighbouring double bond is reused.</summary>
internal static class SmilesDirectionMarks
{
    public static Dictionary<int, char> Assign(Molecule m, SmilesWritePlan plan)
    {
        var marks = new Dictionary<int, char>();
        foreach (var d in m.DoubleBondStereo)
        {
            var bond = m.Bonds[d.Bond];
            var first = m.BondBetween(bond.Begin, d.BeginReference);
            var second = m.BondBetween(bond.End, d.EndReference);
            if (first < 0 || second < 0 || m.Bonds[first].Order != 1 || m.Bonds[second].Order != 1)
            {
                continue;
            }

            var sideA = marks.ContainsKey(first) ? Side(plan, marks[first], first, bond.Begin) : 1;
            var sideB = d.Configuration == DoubleBondConfiguration.Cis ? sideA : -sideA;
            if (marks.ContainsKey(second) && Side(plan, marks[second], second, bond.End) != sideB)
            {
                continue;
            }

            marks[first] = MarkFor(plan, first, bond.Begin, sideA);
            marks[second] = MarkFor(plan, second, bond.End, sideB);
        }

        return marks;
    }

    /// <summary>Side (+1 up, -1 down) of the far atom relative to <paramref name="atom"/> for a written mark.</summary>
    private static int Side(SmilesWritePlan plan, char mark, int bond, int atom)
    {
        var up = mark == '/' ? 1 : -1;
        return plan.BondFirst[bond] == atom ? up : -up;
    }

    private static char MarkFor(SmilesWritePlan plan, int bond, int atom, int side)
    {
        var up = plan.BondFirst[bond] == atom ? side : -side;
        return up > 0 ? '/' : '\\';
    }
}
