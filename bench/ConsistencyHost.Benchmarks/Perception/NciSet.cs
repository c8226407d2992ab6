using ConsistencyHost.Chemistry.Model;
using ConsistencyHost.Chemistry.Smiles;

namespace ConsistencyHost.Benchmarks.Perception;

/// <summary>The NCI first-5K SMILES (Debian rdkit-data), the same set bench/rdkit_baseline.py times.</summary>
public static class NciSet
{
    /// <summary>The SMILES of every line (the first field; the NCI number after the tab is dropped).</summary>
    public static string[] Smiles()
    {
        if (!File.Exists(RepoPaths.NciFirst5K))
        {
            throw new FileNotFoundException($"{RepoPaths.NciFirst5K} is missing; install Debian's rdkit-data", RepoPaths.NciFirst5K);
        }

        return [.. File.ReadLines(RepoPaths.NciFirst5K)
            .Where(line => line.Length > 0)
            .Select(line => line.Split('\t', ' ')[0])];
    }

    /// <summary>
    /// Every line read leniently (strict mode refuses six hypervalent inputs that RDKit refuses too); a line
    /// that still fails stops the benchmark, so the timed set is the whole set.
    /// </summary>
    public static Molecule[] Molecules(string[] smiles) =>
        [.. smiles.Select(s => SmilesReader.Read(s, SmilesReadOptions.Lenient).Value
            ?? throw new InvalidOperationException($"NCI line '{s}' does not read"))];
}
