using BenchmarkDotNet.Attributes;
using ConsistencyHost.Chemistry.Model;
using ConsistencyHost.Chemistry.Perception.Symmetry;
using ConsistencyHost.Chemistry.Smiles;

namespace ConsistencyHost.Benchmarks.Perception;

/// <summary>
/// One operation = the whole NCI 5K set, so the median is seconds per set and molecules per second is the
/// set size over it. bench/rdkit_baseline.py times RDKit on the same lines in the same run.
/// </summary>
[BenchmarkCategory("perception")]
public class PerceptionBenchmarks
{
    private string[] _smiles = [];
    private Molecule[] _molecules = [];

    [GlobalSetup]
    public void Setup()
    {
        _smiles = NciSet.Smiles();
        _molecules = NciSet.Molecules(_smiles);
        Console.WriteLine($"// NCI set: {_molecules.Length} molecules");
    }

    /// <summary>SMILES to molecule, lenient, every line.</summary>
    [Benchmark]
    public int Parse()
    {
        var atoms = 0;
        foreach (var s in _smiles) atoms += SmilesReader.Read(s, SmilesReadOptions.Lenient).Value!.AtomCount;
        return atoms;
    }

    /// <summary>Constitutional classes (automorphism orbits) of every parsed molecule.</summary>
    [Benchmark]
    public int Constitutional()
    {
        var classes = 0;
        foreach (var m in _molecules) classes += ConstitutionalClasses.Of(m).Classes.Length;
        return classes;
    }

    /// <summary>Full stereo-aware NMR classes of every parsed molecule.</summary>
    [Benchmark]
    public int StereoAware()
    {
        var classes = 0;
        foreach (var m in _molecules) classes += NmrEquivalence.Of(m).HydrogenClasses.Length;
        return classes;
    }
}
