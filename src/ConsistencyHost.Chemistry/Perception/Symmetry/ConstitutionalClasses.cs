using System.Collections.Immutable;
using ConsistencyHost.Chemistry.Model;

namespace ConsistencyHost.Chemistry.Perception.Symmetry;

/// <summary>Exact constitutional equivalence classes: orbits of the automorphism group of the coloured heavy-atom graph.</summary>
/// <remarks>Equitable refinement followed by an individualisation–refinement search that proves every merge with
/// an explicit automorphism (McKay 1981; method as in nmr-methods.md §1.5 and §1.9). Unlike refinement alone
/// (Morgan 1965; Weininger et al. 1989), this separates the three carbon orbits of cuneane and the five of C70.
/// Vertex colours: element, isotope, charge, H count, degree, radical; edge colours: perceived-aromatic or order.</remarks>
public sealed class ConstitutionalClasses
{
    internal ConstitutionalClasses(int[] orbit, bool exact)
    {
        OrbitOf = [.. orbit];
        Classes = SymmetryClassLists.FromOrbitIds(orbit);
        IsExact = exact;
    }

    /// <summary>Per atom: the smallest atom index of its orbit.</summary>
    public ImmutableArray<int> OrbitOf { get; }

    /// <summary>Orbits, each sorted ascending, ordered by smallest index.</summary>
    public ImmutableArray<ImmutableArray<int>> Classes { get; }

    /// <summary>False only if the search budget ran out (then a few orbits may be split that should not be).</summary>
    public bool IsExact { get; }

    /// <summary>Computes the classes of a molecule.</summary>
    public static ConstitutionalClasses Of(Molecule molecule)
    {
        var context = SymmetryContext.Create(molecule);
        var orbit = OrbitFinder.Orbits(context.Search, context.Cells, null);
        return new ConstitutionalClasses(orbit, !context.Search.BudgetExceeded);
    }
}
