using ConsistencyHost.Chemistry.Model;
using ConsistencyHost.Chemistry.Smiles;

namespace ConsistencyHost.Spectra.Analysis.Prediction.Carbon.Aromatic;

/// <summary>
/// A parent aromatic ring system with the 13C shift of each ring carbon. Written as SMILES whose atom classes are
/// ring locants (30 = 3a, 40 = 4a, 70 = 7a, 80 = 8a, 90 = 9a, 100 = 10a); <c>Shifts</c> maps a locant to its shift.
/// </summary>
internal sealed class RingTemplate
{
    public RingTemplate(string name, RingKind kind, double spread, string smiles, (int Locant, double Ppm)[] shifts,
        (int Locant, double Ppm)[]? averaged = null)
    {
        Name = name;
        Kind = kind;
        Spread = spread;
        Smiles = smiles;
        var molecule = SmilesReader.Read(smiles).Value
            ?? throw new InvalidOperationException($"Ring template '{name}' has unreadable SMILES '{smiles}'.");
        var context = PredictionContext.Of(molecule);
        Atoms = RingSystemAtom.Describe(context, SystemAtoms(context));
        Adjacency = RingSystemGraph.Adjacency(context, Atoms);
        Signature = RingSystemAtom.Signature(Atoms);
        Ppm = new double[Atoms.Length];
        Averaged = new double[Atoms.Length];
        Labels = new string[Atoms.Length];
        for (var i = 0; i < Atoms.Length; i++)
        {
            var locant = molecule.Atoms[Atoms[i].Index].AtomClass;
            Ppm[i] = Find(shifts, locant);
            Averaged[i] = averaged is null ? double.NaN : Find(averaged, locant);
            Labels[i] = $"{name} C-{LocantName(locant)}";
        }
    }

    /// <summary>Name as reasons print it ("quinoline").</summary>
    public string Name { get; }

    /// <summary>How increments pass on to this system.</summary>
    public RingKind Kind { get; }

    /// <summary>Extra half-width for the template's own values (rows from memory, tautomers).</summary>
    public double Spread { get; }

    /// <summary>The SMILES it was read from.</summary>
    public string Smiles { get; }

    /// <summary>The ring-system atoms in matching order.</summary>
    public RingSystemAtom[] Atoms { get; }

    /// <summary>Which ring-system atoms are bonded (by position in <see cref="Atoms"/>).</summary>
    public bool[,] Adjacency { get; }

    /// <summary>Kind counts, see <see cref="RingSystemAtom.Signature"/>.</summary>
    public ulong Signature { get; }

    /// <summary>Shift of each ring-system atom (NaN for heteroatoms).</summary>
    public double[] Ppm { get; }

    /// <summary>Shift under fast N–H tautomerism (NaN when none is tabulated).</summary>
    public double[] Averaged { get; }

    /// <summary>Reason label of each atom ("indole C-3").</summary>
    public string[] Labels { get; }

    /// <summary>True when the SMILES was perceived fully aromatic (a template that is not cannot match anything).</summary>
    public bool IsUsable => Atoms.Length > 0;

    private static int[] SystemAtoms(PredictionContext context)
    {
        var list = new List<int>();
        for (var i = 0; i < context.Molecule.AtomCount; i++)
        {
            if (context.IsAromatic(i))
            {
                list.Add(i);
            }
        }

        return [.. list];
    }

    private static double Find((int Locant, double Ppm)[] shifts, int locant)
    {
        foreach (var (l, ppm) in shifts)
        {
            if (l == locant)
            {
                return ppm;
            }
        }

        return double.NaN;
    }

    private static string LocantName(int locant) => locant >= 30 && locant % 10 == 0 ? $"{locant / 10}a" : locant.ToString(System.Globalization.CultureInfo.InvariantCulture);
}
