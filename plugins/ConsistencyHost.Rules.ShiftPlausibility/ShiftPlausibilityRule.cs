using System.Collections.Immutable;
using System.Globalization;
using System.Text;
using ConsistencyHost.Sdk.Entries;
using ConsistencyHost.Sdk.Findings;
using ConsistencyHost.Sdk.Rules;
using ConsistencyHost.Spectra.Analysis.Assignment;
using ConsistencyHost.Spectra.Analysis.Interpretation;
using ConsistencyHost.Spectra.Analysis.Prediction;
using ConsistencyHost.Spectra.Model;
using ConsistencyHost.Spectra.Solvents;

namespace ConsistencyHost.Rules.ShiftPlausibility;

/// <summary>
/// Reported 1H and 13C shifts against the predicted window of every class of the structure (the host's shift
/// model, shared through <see cref="EntryAnalysis.Shifts"/>; method and sources in docs/spectrum-model.md).
/// A compound signal that no class can explain is flagged (error when far outside every window, warning when
/// just outside), and so is a non-exchangeable class with no reported signal inside its window. Only the
/// compound's signals are judged: residual solvent, water and impurity lines found by the interpretation are not.
/// Spectra without a stated solvent are skipped (referencing and exchangeable windows are unknown).
/// </summary>
[Rule("shift-plausibility", "1.0.0", "Every reported 1H and 13C shift fits the predicted window of some class of the structure", Nuclei = ["1H", "13C"])]
public sealed class ShiftPlausibilityRule : Rule<ShiftPlausibilityOptions>
{
    /// <inheritdoc />
    protected override IEnumerable<Finding> Check(IEntryView entry, ShiftPlausibilityOptions options, CancellationToken cancellationToken)
    {
        if (entry.Perception is not { } perception) yield break;
        for (var i = 0; i < entry.Spectra.Count; i++)
        {
            cancellationToken.ThrowIfCancellationRequested();
            var spectrum = entry.Spectra[i];
            if (spectrum.Nucleus is not (Nucleus.H1 or Nucleus.C13) || string.IsNullOrWhiteSpace(spectrum.Solvent)) continue;
            if (entry.Analysis.Shifts(i) is not { } shifts) continue;
            var judged = spectrum.Nucleus == Nucleus.H1
                ? ProtonSpectrum(entry, perception, shifts, i, options)
                : CarbonSpectrum(perception, shifts, i, spectrum, options);
            foreach (var finding in judged) yield return finding;
        }
    }

    private static IEnumerable<Finding> ProtonSpectrum(IEntryView entry, StructurePerception perception, ClassShifts shifts, int index, ShiftPlausibilityOptions options)
    {
        if (entry.Analysis.Protons(index) is not { } interpretation) return [];
        var classes = perception.Equivalence.HydrogenClasses;
        var table = new ClassTable(
            "1H", shifts.Hydrogen, options.ProtonSlackPpm, options.ProtonFarPpm,
            c => DistinctAtoms(classes[c].ParentAtoms),
            c => string.Create(CultureInfo.InvariantCulture, $"{classes[c].ParentAtoms.Length} H on {Atoms(perception, classes[c].ParentAtoms)}"),
            c => !classes[c].IsExchangeable);
        var assigned = AssignedClasses(interpretation);
        return table.Judge(entry.Spectra[index], index, interpretation.CompoundSignals, s => assigned.GetValueOrDefault(s));
    }

    private static IEnumerable<Finding> CarbonSpectrum(StructurePerception perception, ClassShifts shifts, int index, Spectrum spectrum, ShiftPlausibilityOptions options)
    {
        var classes = perception.Equivalence.CarbonClasses13C;
        var counted = CompoundLines(spectrum);
        var table = new ClassTable(
            "13C", shifts.Carbon, options.CarbonSlackPpm, options.CarbonFarPpm,
            c => [.. classes[c]],
            c => Atoms(perception, classes[c]),
            _ => true);
        return table.Judge(spectrum, index, counted, _ => null);
    }

    /// <summary>13C lines judged: all but another species' lines and lines on the solvent's own residual line.</summary>
    private static List<int> CompoundLines(Spectrum spectrum)
    {
        var onSolvent = new ResidualMatcher().OnSolventLine(spectrum);
        var counted = new List<int>(spectrum.Signals.Count);
        for (var s = 0; s < spectrum.Signals.Count; s++)
        {
            if (!onSolvent[s] && !spectrum.Signals[s].IsMinorSpecies()) counted.Add(s);
        }

        return counted;
    }

    /// <summary>
    /// For each compound signal, the structure classes its assigned classes stand for, together with every class
    /// the solver could not tell from them (same size and coupling numbers), in ascending order: the solver does
    /// not read shifts, so among interchangeable classes its choice says nothing.
    /// </summary>
    private static Dictionary<int, IReadOnlyList<int>> AssignedClasses(ProtonInterpretation interpretation)
    {
        var bySignal = new Dictionary<int, IReadOnlyList<int>>();
        if (interpretation.Assignment is not { } assignment) return bySignal;
        var twins = TwinSources(interpretation.Classes);
        for (var k = 0; k < interpretation.CompoundSignals.Count && k < assignment.ClassesBySignal.Count; k++)
        {
            var held = assignment.ClassesBySignal[k];
            if (held.Count == 0) continue;
            var sources = new SortedSet<int>();
            foreach (var input in held) sources.UnionWith(twins[input]);
            if (sources.Count > 0) bySignal[interpretation.CompoundSignals[k]] = [.. sources];
        }

        return bySignal;
    }

    /// <summary>
    /// For each solver input, the structure classes behind every input interchangeable with it (itself included):
    /// one pass grouping the inputs by what the solver sees of them.
    /// </summary>
    private static List<int>[] TwinSources(IReadOnlyList<ClassInput> classes)
    {
        var groups = new Dictionary<(int, bool, int, int), List<int>>();
        var result = new List<int>[classes.Count];
        for (var i = 0; i < classes.Count; i++)
        {
            var c = classes[i];
            var key = (c.Size, c.IsExchangeable, c.TypicalCoupledProtons, c.MaxCoupledProtons);
            if (!groups.TryGetValue(key, out var group)) groups[key] = group = [];
            if (c.Source >= 0 && !group.Contains(c.Source)) group.Add(c.Source);
            result[i] = group;
        }

        return result;
    }

    /// <summary>"C4,C7": each atom once, in first-seen order.</summary>
    private static string Atoms(StructurePerception perception, ImmutableArray<int> atoms)
    {
        var text = new StringBuilder();
        for (var i = 0; i < atoms.Length; i++)
        {
            if (atoms.IndexOf(atoms[i]) < i) continue;
            if (text.Length > 0) text.Append(',');
            text.Append(CultureInfo.InvariantCulture, $"{perception.Molecule.Atoms[atoms[i]].Symbol}{atoms[i]}");
        }

        return text.ToString();
    }

    /// <summary>Each atom once, in first-seen order (a hydrogen class lists its parent once per H).</summary>
    private static int[] DistinctAtoms(ImmutableArray<int> atoms)
    {
        var kept = new List<int>(atoms.Length);
        foreach (var atom in atoms)
        {
            if (!kept.Contains(atom)) kept.Add(atom);
        }

        return [.. kept];
    }
}
