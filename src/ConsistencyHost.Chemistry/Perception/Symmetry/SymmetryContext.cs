using ConsistencyHost.Chemistry.Model;
using ConsistencyHost.Chemistry.Perception.Rings;

namespace ConsistencyHost.Chemistry.Perception.Symmetry;

/// <summary>The graph, refiner, search and equitable partition shared by the symmetry computations of one molecule.</summary>
internal sealed record SymmetryContext(
    Molecule Molecule, RingSet Rings, Aromaticity Aromaticity, ColouredGraph Graph, PartitionRefiner Refiner,
    AutomorphismSearch Search, int[] Cells)
{
    /// <summary>True when the equitable partition is discrete: the automorphism group is trivial, so every
    /// configuration has the same (trivial) symmetry and the searches reduce to the identity.</summary>
    public bool IsRigid { get; } = PartitionRefiner.CountCells(Cells) == Cells.Length;

    public static SymmetryContext Create(Molecule molecule)
    {
        var rings = RingSet.Of(molecule);
        var aromaticity = Aromaticity.Of(molecule, rings);
        var graph = new ColouredGraph(molecule, aromaticity);
        var refiner = new PartitionRefiner(graph);
        var search = new AutomorphismSearch(graph, refiner);
        return new SymmetryContext(molecule, rings, aromaticity, graph, refiner, search, refiner.Initial());
    }
}
