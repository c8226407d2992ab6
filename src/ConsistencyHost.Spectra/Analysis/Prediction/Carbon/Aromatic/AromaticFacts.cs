namespace ConsistencyHost.Spectra.Analysis.Prediction.Carbon.Aromatic;

/// <summary>
/// Per-molecule result of template matching: for each aromatic atom, the template and template position it matched
/// (or none), and whether its system carries an N–H that may tautomerise. Computed once per context.
/// </summary>
internal sealed class AromaticFacts
{
    private AromaticFacts(int atomCount)
    {
        Template = new RingTemplate?[atomCount];
        TemplateAtom = new int[atomCount];
        SystemSize = new int[atomCount];
        TautomericNH = new bool[atomCount];
        RingSize = new int[atomCount];
        RingHasHetero = new bool[atomCount];
    }

    /// <summary>Indices (into <see cref="PredictionContext.Rings"/>) of the fully aromatic rings holding each atom.</summary>
    public int[][] AromaticRingsOf { get; private set; } = [];

    /// <summary>Per ring: true when the ring is aromatic and two neighbouring carbons carry O/N donors.</summary>
    public bool[] RingHasOrthoDonors { get; private set; } = [];

    /// <summary>Size of the smallest fully aromatic ring holding the atom (0 when none).</summary>
    public int[] RingSize { get; }

    /// <summary>True when that ring holds a heteroatom (the atom sits in a heteroaromatic ring).</summary>
    public bool[] RingHasHetero { get; }

    /// <summary>True for an aromatic atom of a five-membered heteroaromatic ring (furan, thiophene, azoles …).</summary>
    public bool IsFiveRingHeteroaryl(int atom) => RingSize[atom] == 5 && RingHasHetero[atom];

    /// <summary>The matched template of each atom (null when unmatched or not aromatic).</summary>
    public RingTemplate?[] Template { get; }

    /// <summary>The atom's position in its template.</summary>
    public int[] TemplateAtom { get; }

    /// <summary>Atoms in the atom's aromatic ring system (0 when not aromatic).</summary>
    public int[] SystemSize { get; }

    /// <summary>True when the atom's system has a pyrrole-type N bearing H.</summary>
    public bool[] TautomericNH { get; }

    /// <summary>The facts of <paramref name="context"/>'s molecule, computed once and kept by the context.</summary>
    public static AromaticFacts Of(PredictionContext context) => context.Facts(ref context.AromaticFactsSlot, Compute);

    private static AromaticFacts Compute(PredictionContext context)
    {
        var facts = new AromaticFacts(context.Molecule.AtomCount);
        AssignRings(context, facts);
        foreach (var atoms in RingSystemGraph.Systems(context))
        {
            var system = RingSystemAtom.Describe(context, atoms);
            var hasNH = false;
            foreach (var a in system)
            {
                facts.SystemSize[a.Index] = atoms.Length;
                hasNH |= a.Kind == RingSystemAtom.PyrroleNitrogenKind && context.Molecule.Atoms[a.Index].HydrogenCount > 0;
            }

            foreach (var a in system)
            {
                facts.TautomericNH[a.Index] = hasNH;
            }

            if (atoms.Length <= 24 && RingTemplates.Candidates(system.Length, RingSystemAtom.Signature(system)).Length > 0)
            {
                Assign(facts, system, RingSystemGraph.Adjacency(context, system));
            }
        }

        return facts;
    }

    private static void AssignRings(PredictionContext context, AromaticFacts facts)
    {
        var rings = context.Rings.Rings;
        var lists = new List<int>?[context.Molecule.AtomCount];
        facts.RingHasOrthoDonors = new bool[rings.Length];
        for (var r = 0; r < rings.Length; r++)
        {
            var ring = rings[r];
            var aromatic = true;
            var hetero = false;
            foreach (var a in ring)
            {
                aromatic &= context.IsAromatic(a);
                hetero |= context.Molecule.Atoms[a].AtomicNumber != Core.Topology.Carbon;
            }

            if (!aromatic)
            {
                continue;
            }

            facts.RingHasOrthoDonors[r] = OrthoDonors.HasAdjacentDonors(context, ring);
            foreach (var a in ring)
            {
                (lists[a] ??= []).Add(r);
                if (facts.RingSize[a] == 0 || ring.Length < facts.RingSize[a])
                {
                    facts.RingSize[a] = ring.Length;
                    facts.RingHasHetero[a] = hetero;
                }
            }
        }

        facts.AromaticRingsOf = Array.ConvertAll(lists, l => l is null ? [] : l.ToArray());
    }

    private static void Assign(AromaticFacts facts, RingSystemAtom[] system, bool[,] adjacency)
    {
        foreach (var template in RingTemplates.Candidates(system.Length, RingSystemAtom.Signature(system)))
        {
            if (TemplateMatcher.Match(template, system, adjacency) is not { } map)
            {
                continue;
            }

            for (var t = 0; t < map.Length; t++)
            {
                var atom = system[map[t]].Index;
                facts.Template[atom] = template;
                facts.TemplateAtom[atom] = t;
            }

            return;
        }
    }
}
