using System.Globalization;
using ConsistencyHost.Chemistry.Smiles;

namespace ConsistencyHost.Spectra.Analysis.Prediction.Proton.Aromatic;

/// <summary>
/// Ring-position key → parent shift, built once from <see cref="HeteroaromaticParents"/>. Where two parents give
/// one key (isoquinoline's benzo ring and naphthalene's) the entry spans both values.
/// </summary>
internal static class HeteroaromaticLookup
{
    private static readonly Dictionary<ulong, ParentPosition> Positions = Build();

    /// <summary>The parent position for a key, or null.</summary>
    public static ParentPosition? Find(ulong key) => key != 0 && Positions.TryGetValue(key, out var p) ? p : null;

    /// <summary>How many distinct positions the table holds (for tests).</summary>
    internal static int Count => Positions.Count;

    private static Dictionary<ulong, ParentPosition> Build()
    {
        var map = new Dictionary<ulong, ParentPosition>();
        foreach (var (name, smiles, shifts, halfWidth, source) in HeteroaromaticParents.All)
        {
            var molecule = SmilesReader.Read(smiles).Value
                ?? throw new InvalidOperationException($"Parent heteroaromatic '{name}' has an unreadable SMILES '{smiles}'.");
            var context = PredictionContext.Of(molecule);
            var values = shifts.Split(',', StringSplitOptions.TrimEntries);
            if (values.Length != molecule.AtomCount)
            {
                throw new InvalidOperationException($"Parent '{name}': {values.Length} shifts for {molecule.AtomCount} atoms.");
            }

            for (var atom = 0; atom < values.Length; atom++)
            {
                if (values[atom] != "-")
                {
                    Add(map, context, atom, new ParentPosition(name, double.Parse(values[atom], CultureInfo.InvariantCulture), halfWidth, source));
                }
            }
        }

        return map;
    }

    private static void Add(Dictionary<ulong, ParentPosition> map, PredictionContext context, int atom, ParentPosition position)
    {
        var ring = AromaticRing.Of(context, atom);
        var key = ring.IsEmpty ? 0 : RingPositionKey.Of(context, ring, ring.IndexOf(atom));
        if (key == 0)
        {
            throw new InvalidOperationException($"Parent '{position.Parent}' atom {atom} is not an aromatic ring position.");
        }

        map[key] = map.TryGetValue(key, out var existing) ? existing.Spanning(position) : position;
    }
}

/// <summary>A tabulated parent ring position.</summary>
/// <param name="Parent">Parent name ("quinoline").</param>
/// <param name="Ppm">Shift (mean when several parents share the position).</param>
/// <param name="HalfWidth">Half-width, including the spread of parents sharing the position.</param>
/// <param name="Source">'P' published table, 'M' from memory.</param>
internal sealed record ParentPosition(string Parent, double Ppm, double HalfWidth, char Source)
{
    /// <summary>One entry covering this and <paramref name="other"/>.</summary>
    public ParentPosition Spanning(ParentPosition other)
    {
        var low = Math.Min(Ppm - HalfWidth, other.Ppm - other.HalfWidth);
        var high = Math.Max(Ppm + HalfWidth, other.Ppm + other.HalfWidth);
        var parent = Parent == other.Parent ? Parent : Parent + "/" + other.Parent;
        return new ParentPosition(parent, (low + high) / 2, (high - low) / 2, Source == 'M' || other.Source == 'M' ? 'M' : 'P');
    }
}
