using System.Runtime.CompilerServices;

namespace ConsistencyHost.Spectra.Analysis.Prediction.Carbon.Aromatic;

/// <summary>
/// Per-molecule result of template matching: for each aromatic atom, the template and template position it matched
/// (or none), and whether its system carries an N–H that may tautomerise. Computed once per context.
/// </summary>
internal sealed class AromaticFacts
{
    private static readonly ConditionalWeakTable<PredictionContext, AromaticFacts> Cache = new();

    private AromaticFacts(int atomCount)
    {
        Template = new RingTemplate?[atomCount];
        TemplateAtom = new int[atomCount];
        SystemSize = new int[atomCount];
        TautomericNH = new bool[atomCount];
    }

    /// <summary>The matched template of each atom (null when unmatched or not aromatic).</summary>
    public RingTemplate?[] Template { get; }

    /// <summary>The atom's position in its template.</summary>
    public int[] TemplateAtom { get; }

    /// <summary>Atoms in the atom's aromatic ring system (0 when not aromatic).</summary>
    public int[] SystemSize { get; }

    /// <summary>True when the atom's system has a pyrrole-type N bearing H.</summary>
    public bool[] TautomericNH { get; }

    /// <summary>The facts of <paramref name="context"/>'s molecule.</summary>
    public static AromaticFacts Of(PredictionContext context) => Cache.GetValue(context, Compute);

    private static AromaticFacts Compute(PredictionContext context)
    {
        var facts = new AromaticFacts(context.Molecule.AtomCount);
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

            if (atoms.Length <= 24)
            {
                Assign(facts, system, RingSystemGraph.Adjacency(context, system));
            }
        }

        return facts;
    }

    private static void Assign(AromaticFacts facts, RingSystemAtom[] system, bool[,] adjacency)
    {
        foreach (var template in RingTemplates.All)
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
