using ConsistencyHost.Chemistry.Model;
using ConsistencyHost.Chemistry.Perception.Rings;

namespace ConsistencyHost.Chemistry.Perception.Symmetry;

/// <summary>The heavy-atom graph in CSR form with vertex invariants and bond colours, for refinement and search.</summary>
/// <remarks>Vertex invariant: element, isotope, charge, attached-H count, degree, radical (one ulong, one field
/// per bit range). Bond colour: 4 for a perceived aromatic bond, otherwise the bond order, so both Kekulé forms
/// of an arene give the same graph.</remarks>
internal sealed class ColouredGraph
{
    public ColouredGraph(Molecule molecule, Aromaticity aromaticity)
    {
        Count = molecule.AtomCount;
        Start = new int[Count + 1];
        Invariant = new ulong[Count];
        for (var v = 0; v < Count; v++)
        {
            Start[v + 1] = Start[v] + molecule.Degree(v);
        }

        Adjacent = new int[Start[Count]];
        EdgeColour = new int[Start[Count]];
        for (var v = 0; v < Count; v++)
        {
            var neighbours = molecule.Neighbours(v);
            var bonds = molecule.BondsOf(v);
            for (var k = 0; k < neighbours.Length; k++)
            {
                Adjacent[Start[v] + k] = neighbours[k];
                EdgeColour[Start[v] + k] = aromaticity.AromaticBonds[bonds[k]] ? 4 : molecule.Bonds[bonds[k]].Order;
            }

            Invariant[v] = Pack(molecule.Atoms[v], neighbours.Length);
        }
    }

    public int Count { get; }

    public int[] Start { get; }

    public int[] Adjacent { get; }

    public int[] EdgeColour { get; }

    public ulong[] Invariant { get; }

    public int Degree(int v) => Start[v + 1] - Start[v];

    /// <summary>Colour of the edge v–w, or -1 when absent.</summary>
    public int ColourBetween(int v, int w)
    {
        for (var k = Start[v]; k < Start[v + 1]; k++)
        {
            if (Adjacent[k] == w)
            {
                return EdgeColour[k];
            }
        }

        return -1;
    }

    private static ulong Pack(Atom a, int degree)
    {
        ulong value = (ulong)(uint)a.AtomicNumber & 0xFF;
        value = (value << 10) | ((ulong)(uint)a.Isotope & 0x3FF);
        value = (value << 8) | ((ulong)(uint)(a.Charge + 128) & 0xFF);
        value = (value << 5) | ((ulong)(uint)Math.Min(a.HydrogenCount, 31) & 0x1F);
        value = (value << 6) | ((ulong)(uint)Math.Min(degree, 63) & 0x3F);
        value = (value << 2) | ((ulong)(uint)a.Radical & 0x3);
        return value;
    }
}
