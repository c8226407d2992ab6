using System.Collections.Immutable;
using System.Globalization;
using System.Text;
using ConsistencyHost.Chemistry.Model;

namespace ConsistencyHost.Chemistry.Smiles;

/// <summary>Writes a molecule as SMILES: every atom in brackets with its H count, Kekulé bond orders, ring
/// closures, '@'/'@@' and '/' '\'. Not canonical: atoms are written in depth-first order from the lowest index.</summary>
/// <remarks>Meant for round trips and diagnostics. Aromatic atoms are written in Kekulé form (uppercase), so the
/// read-back molecule has the same graph and orders but no as-read aromatic flags. Conjugated stereo double bonds
/// whose '/' '\' marks would conflict lose the later configuration.</remarks>
public static class SmilesWriter
{
    /// <summary>SMILES text.</summary>
    public static string Write(Molecule molecule) => WriteWithOrder(molecule).Smiles;

    /// <summary>SMILES text and, per written atom position, the molecule's atom index.</summary>
    public static (string Smiles, ImmutableArray<int> AtomOrder) WriteWithOrder(Molecule molecule)
    {
        ArgumentNullException.ThrowIfNull(molecule);
        var plan = SmilesWritePlan.Create(molecule);
        var marks = SmilesDirectionMarks.Assign(molecule, plan);
        var sb = new StringBuilder();
        var order = new List<int>();
        foreach (var root in plan.Roots)
        {
            if (sb.Length > 0)
            {
                sb.Append('.');
            }

            Emit(molecule, plan, marks, root, -1, sb, order);
        }

        return (sb.ToString(), [.. order]);
    }

    private static void Emit(Molecule m, SmilesWritePlan plan, Dictionary<int, char> marks, int atom, int parentBond, StringBuilder sb, List<int> order)
    {
        EmitOne(m, plan, marks, atom, parentBond, sb, order);
        var children = plan.Children[atom];
        for (var i = 0; i < children.Count; i++)
        {
            var (child, bond) = children[i];
            var branch = i < children.Count - 1;
            sb.Append(branch ? "(" : string.Empty);
            Emit(m, plan, marks, child, bond, sb, order);
            sb.Append(branch ? ")" : string.Empty);
        }
    }

    private static void EmitOne(Molecule m, SmilesWritePlan plan, Dictionary<int, char> marks, int atom, int parentBond, StringBuilder sb, List<int> order)
    {
        if (parentBond >= 0)
        {
            sb.Append(BondSymbol(m, marks, parentBond));
        }

        order.Add(atom);
        sb.Append(AtomText(m, plan, atom));
        foreach (var (bond, number, opening) in plan.RingDigits[atom])
        {
            if (opening)
            {
                sb.Append(BondSymbol(m, marks, bond));
            }

            sb.Append(number < 10 ? number.ToString(CultureInfo.InvariantCulture) : "%" + number.ToString(CultureInfo.InvariantCulture));
        }
    }

    private static string BondSymbol(Molecule m, Dictionary<int, char> marks, int bond) => m.Bonds[bond].Order switch
    {
        2 => "=",
        3 => "#",
        4 => "$",
        _ => marks.TryGetValue(bond, out var c) ? c.ToString() : string.Empty,
    };

    private static string AtomText(Molecule m, SmilesWritePlan plan, int atom)
    {
        var a = m.Atoms[atom];
        var sb = new StringBuilder("[");
        if (a.Isotope > 0)
        {
            sb.Append(a.Isotope.ToString(CultureInfo.InvariantCulture));
        }

        sb.Append(a.AtomicNumber == 0 ? "*" : a.Symbol);
        sb.Append(plan.Chirality(m, atom));
        if (a.HydrogenCount > 0)
        {
            sb.Append('H');
            sb.Append(a.HydrogenCount > 1 ? a.HydrogenCount.ToString(CultureInfo.InvariantCulture) : string.Empty);
        }

        if (a.Charge != 0)
        {
            sb.Append(a.Charge > 0 ? '+' : '-');
            sb.Append(Math.Abs(a.Charge) > 1 ? Math.Abs(a.Charge).ToString(CultureInfo.InvariantCulture) : string.Empty);
        }

        if (a.AtomClass > 0)
        {
            sb.Append(':').Append(a.AtomClass.ToString(CultureInfo.InvariantCulture));
        }

        return sb.Append(']').ToString();
    }
}
