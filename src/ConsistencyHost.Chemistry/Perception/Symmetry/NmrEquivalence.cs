using System.Collections.Immutable;
using ConsistencyHost.Chemistry.Model;
using ConsistencyHost.Chemistry.Perception.Rings;
using ConsistencyHost.Chemistry.Perception.Stereo;

namespace ConsistencyHost.Chemistry.Perception.Symmetry;

/// <summary>Stereo-aware NMR equivalence: hydrogen and carbon classes, exchangeable hydrogens, coupling partners
/// and the expected signal-count ranges.</summary>
/// <remarks>
/// Algorithm A of nmr-methods.md §2.2: automorphisms of the heavy-atom graph (found by the individualisation–
/// refinement search, McKay 1981) are classified by their action on the stereo parities: all kept → rotation-like,
/// all tetrahedral inverted and double bonds kept → reflection-like (Mislow &amp; Siegel, J. Am. Chem. Soc. 106,
/// 3319, 1984). Homotopic and enantiotopic atoms are merged (achiral solvent); diastereotopic ones are not.
/// The two H of a CH2 are exchanged only by a rotation swapping its two ligands or by a reflection fixing them;
/// those of =CH2 only by a symmetry swapping the other end's two ligands. Unspecified stereo elements are
/// enumerated (§2.4) and the counts become ranges. This is the fast-exchange limit of a 2D structure (§2.6).
/// </remarks>
public sealed class NmrEquivalence
{
    private NmrEquivalence(ImmutableArray<HydrogenClass> hydrogens, ImmutableArray<ImmutableArray<int>> carbons,
        ConstitutionalClasses constitutional, SignalCountRange h, SignalCountRange c, int configurations)
    {
        HydrogenClasses = hydrogens;
        CarbonClasses13C = carbons;
        Constitutional = constitutional;
        Expected1H = h;
        Expected13C = c;
        ConfigurationsConsidered = configurations;
        ExchangeableHydrogens = [.. hydrogens.Select(x => x.IsExchangeable)];
    }

    /// <summary>Hydrogen classes of the configuration with the most classes, ordered by smallest parent index.</summary>
    public ImmutableArray<HydrogenClass> HydrogenClasses { get; }

    /// <summary>Per hydrogen class: exchangeable (O–H, N–H, S–H).</summary>
    public ImmutableArray<bool> ExchangeableHydrogens { get; }

    /// <summary>Carbon classes (stereo-aware), each sorted, ordered by smallest index.</summary>
    public ImmutableArray<ImmutableArray<int>> CarbonClasses13C { get; }

    /// <summary>The stereo-free constitutional orbits.</summary>
    public ConstitutionalClasses Constitutional { get; }

    /// <summary>Expected number of 1H signals.</summary>
    public SignalCountRange Expected1H { get; }

    /// <summary>Expected number of 13C signals.</summary>
    public SignalCountRange Expected13C { get; }

    /// <summary>False when an automorphism search ran out of its node budget (highly symmetric inputs such as long
    /// perfluoroalkyl chains); classes may then be split more finely than the true symmetry allows.</summary>
    public bool IsExact { get; private init; } = true;

    /// <summary>The smallest set of smallest rings the classes were perceived on (shared so later steps need not perceive it again).</summary>
    public required RingSet Rings { get; init; }

    /// <summary>The aromaticity the classes were perceived with (shared with <see cref="Rings"/>).</summary>
    public required Aromaticity Aromaticity { get; init; }

    /// <summary>Number of relative configurations evaluated (1 when all stereo is specified or absent).</summary>
    public int ConfigurationsConsidered { get; }

    /// <summary>Computes the classes of a molecule.</summary>
    public static NmrEquivalence Of(Molecule molecule)
    {
        ArgumentNullException.ThrowIfNull(molecule);
        var ctx = SymmetryContext.Create(molecule);
        var group = ctx.IsRigid ? null : AutomorphismGroup.TryList(ctx);
        var constitutionalOrbit = group?.Orbits(_ => true) ?? OrbitFinder.Orbits(ctx.Search, ctx.Cells, null);
        var constitutional = new ConstitutionalClasses(constitutionalOrbit, !ctx.Search.BudgetExceeded);
        var (tetra, doubles) = StereoCandidates.Find(ctx);
        var independent = ctx.IsRigid || StereoElementsFixed(constitutionalOrbit, tetra, doubles);
        var stats = new List<ConfigurationStats>();
        var elements = new List<(List<TetrahedralElement>, List<DoubleBondElement>)>();
        var startCells = ctx.IsRigid || group is not null ? ctx.Cells : ConfigurationSymmetry.StartCells(ctx, tetra, doubles);
        foreach (var (t, d) in StereoEnumeration.Configurations(tetra, doubles))
        {
            stats.Add(ConfigurationStats.Of(molecule, ConfigurationSymmetry.Compute(ctx, t, d, null, startCells, group), constitutionalOrbit));
            elements.Add((t, d));
            if (independent)
            {
                break; // no automorphism moves a stereo element: every configuration gives the same classes
            }
        }

        (stats, elements) = RingFixedConfigurations.KeepMostSymmetric(stats, elements);
        var best = stats.MaxBy(s => s.HydrogenClassCount)!;
        var slow = SlowRotation(ctx, group, elements[stats.IndexOf(best)], constitutionalOrbit);
        var hydrogens = CouplingPartners.Attach(molecule, ctx.Aromaticity, HydrogenClassBuilder.Build(molecule, best.Symmetry));
        var carbons = CarbonClasses(molecule, best.Symmetry.Orbit);
        var unspecified = StereoEnumeration.UnspecifiedCount(tetra, doubles);
        var exact = !ctx.Search.BudgetExceeded;
        var (h, c) = MetalGeometry.Widen(molecule, constitutionalOrbit, hydrogens, carbons,
            SignalCountRanges.Hydrogen(stats, unspecified, independent, exact, slow), SignalCountRanges.Carbon(stats, unspecified, independent, exact, slow));
        return new NmrEquivalence(hydrogens, carbons, constitutional, h, c, stats.Count)
        {
            IsExact = exact,
            Rings = ctx.Rings,
            Aromaticity = ctx.Aromaticity,
        };
    }

    /// <summary>The upper-bound configuration with slow amide C–N rotation, or null when there is no such bond.</summary>
    private static (ConfigurationStats Stats, int Bonds)? SlowRotation(
        SymmetryContext ctx, AutomorphismGroup? group, (List<TetrahedralElement> Tetra, List<DoubleBondElement> Doubles) config, int[] constitutionalOrbit)
    {
        var (amides, nitrogens) = AmideRotation.Find(ctx);
        if (amides.Count == 0 && nitrogens.Count == 0)
        {
            return null;
        }

        var symmetry = ConfigurationSymmetry.Compute(ctx, config.Tetra, [.. config.Doubles, .. amides], nitrogens, group: group);
        return (ConfigurationStats.Of(ctx.Molecule, symmetry, constitutionalOrbit), amides.Count + nitrogens.Count);
    }

    /// <summary>True when every atom of every stereo element (centres, their neighbours, double-bond ends and
    /// references) is alone in its constitutional orbit: then every automorphism fixes them all, acts on every
    /// parity as the identity, and the configuration cannot change the classes.</summary>
    private static bool StereoElementsFixed(int[] orbit, List<TetrahedralElement> tetra, List<DoubleBondElement> doubles)
    {
        var size = new int[orbit.Length];
        foreach (var o in orbit)
        {
            size[o]++;
        }

        bool Alone(int atom) => atom < 0 || size[orbit[atom]] == 1;
        return tetra.TrueForAll(t => Alone(t.Centre) && Array.TrueForAll(t.Neighbours, Alone))
            && doubles.TrueForAll(d => Alone(d.Begin) && Alone(d.End) && Alone(d.BeginReference) && Alone(d.EndReference));
    }

    private static ImmutableArray<ImmutableArray<int>> CarbonClasses(Molecule m, int[] orbit)
    {
        var ids = new int[m.AtomCount];
        for (var v = 0; v < ids.Length; v++)
        {
            ids[v] = m.Atoms[v].AtomicNumber == 6 ? orbit[v] : -1 - v;
        }

        return [.. SymmetryClassLists.FromOrbitIds(ids).Where(c => m.Atoms[c[0]].AtomicNumber == 6)];
    }
}
