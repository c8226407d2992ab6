using ConsistencyHost.Spectra.Analysis.Prediction.Carbon.Core;

namespace ConsistencyHost.Spectra.Analysis.Prediction.Carbon.Aromatic;

/// <summary>What matching compares for one atom of an aromatic ring system.</summary>
/// <param name="Index">Atom index in its molecule.</param>
/// <param name="Kind">Element and type: see <see cref="KindOf"/>.</param>
/// <param name="SystemDegree">Neighbours inside the ring system.</param>
internal readonly record struct RingSystemAtom(int Index, byte Kind, int SystemDegree)
{
    public const byte CarbonKind = 1;
    public const byte OxoCarbonKind = 2;
    public const byte PyridineNitrogenKind = 3;
    public const byte PyrroleNitrogenKind = 4;
    public const byte OxygenKind = 5;
    public const byte SulfurKind = 6;
    public const byte OtherKind = 7;

    /// <summary>Describes the ring-system atoms <paramref name="atoms"/> (all aromatic, connected).</summary>
    public static RingSystemAtom[] Describe(PredictionContext context, int[] atoms)
    {
        var result = new RingSystemAtom[atoms.Length];
        for (var i = 0; i < atoms.Length; i++)
        {
            var degree = 0;
            foreach (var x in context.Molecule.Neighbours(atoms[i]))
            {
                if (context.IsAromatic(x) && context.IsAromaticBond(atoms[i], x))
                {
                    degree++;
                }
            }

            result[i] = new RingSystemAtom(atoms[i], KindOf(context, atoms[i]), degree);
        }

        return result;
    }

    /// <summary>
    /// Carbon, carbon with an exocyclic C=O/C=S, pyridine-type N (two connections, neutral), pyrrole-type N (three
    /// connections counting H, neutral: N–H, N–R or a bridgehead), O, S; charged nitrogen and other elements are
    /// "other" and match no template.
    /// </summary>
    public static byte KindOf(PredictionContext context, int atom)
    {
        var m = context.Molecule;
        var a = m.Atoms[atom];
        return a.AtomicNumber switch
        {
            Topology.Carbon => Topology.IsCarbonylCarbon(m, atom) ? OxoCarbonKind : CarbonKind,
            Topology.Nitrogen when a.Charge != 0 => OtherKind,
            Topology.Nitrogen => m.Degree(atom) + a.HydrogenCount >= 3 ? PyrroleNitrogenKind : PyridineNitrogenKind,
            Topology.Oxygen => OxygenKind,
            Topology.Sulfur => SulfurKind,
            _ => OtherKind,
        };
    }

    /// <summary>Counts of each kind packed into one number (8 bits per kind), to pick candidate templates fast.</summary>
    public static ulong Signature(RingSystemAtom[] atoms)
    {
        ulong signature = 0;
        foreach (var a in atoms)
        {
            signature += 1UL << (8 * (a.Kind - 1));
        }

        return signature;
    }
}
