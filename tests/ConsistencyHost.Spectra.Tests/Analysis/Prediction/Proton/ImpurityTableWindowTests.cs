using ConsistencyHost.Spectra.Analysis.Prediction;
using ConsistencyHost.Spectra.Model;
using ConsistencyHost.Spectra.Solvents;
using Xunit.Abstractions;

namespace ConsistencyHost.Spectra.Tests.Analysis.Prediction.Proton;

/// <summary>
/// Every tabulated 1H shift of the published impurity tables — Gottlieb, Kotlyar &amp; Nudelman, J. Org. Chem.
/// 1997, 62, 7512 (Table 1) and Fulmer et al., Organometallics 2010, 29, 2176 (Table 1), as held by
/// <see cref="ImpurityTable"/> with per-cell provenance, plus the water lines of <see cref="ResidualSolventTable"/>
/// (Gottlieb 1997) — lies inside the predicted window of the hydrogens it belongs to, in CDCl3 and DMSO-d6.
/// </summary>
public sealed class ImpurityTableWindowTests(ITestOutputHelper output)
{
    private static readonly string[] Solvents = ["CDCl3", "DMSO-d6"];

    [Fact]
    public void EveryImpurityRowWithAStructureOrRepresentative_IsMappedToAtoms()
    {
        foreach (var impurity in ImpurityTable.All)
        {
            Assert.True(ImpurityAtomMap.Map.TryGetValue(impurity.Name, out var entry), $"no atom map for {impurity.Name}");
            foreach (var group in impurity.Groups)
            {
                var hasProtonShift = group.Shifts.Any(s => s.Nucleus == Nucleus.H1);
                Assert.True(!hasProtonShift || entry.Groups.ContainsKey(group.Label), $"{impurity.Name} {group.Label} is not mapped");
            }
        }
    }

    [Fact]
    public void EveryTabulatedProtonShift_LiesInsideItsWindow()
    {
        var misses = Cases().Where(c => !c.Prediction.Window.Contains(c.Ppm))
            .Select(c => $"{c.Name} {c.Group} {c.Solvent} {c.Ppm:0.00} [{c.Source}] outside {ProtonWindows.Describe(c.Prediction)}").ToList();
        Assert.True(misses.Count == 0, string.Join(Environment.NewLine, misses));
    }

    [Fact]
    public void MedianWindowWidth_OverTheImpurityClasses_IsAtMostOnePpm()
    {
        // Target of the spectrum model (issue 12): median 1H window width <= 1.0 ppm on the published impurity classes.
        // One class = one tabulated group in one solvent; its window is the union over the group's atoms.
        var classes = Cases().GroupBy(c => (c.Name, c.Group, c.Solvent))
            .Select(g => (Width: g.Max(c => c.Prediction.Window.High) - g.Min(c => c.Prediction.Window.Low),
                Exchangeable: g.First().Prediction.Basis == ShiftBasis.Exchangeable,
                Text: $"{g.Key.Name} {g.Key.Group} {g.Key.Solvent}: {ProtonWindows.Describe(g.First().Prediction)}"))
            .OrderBy(w => w.Width).ToList();
        var median = Median(classes.Select(c => c.Width).ToList());
        var carbon = classes.Where(c => !c.Exchangeable).ToList();
        output.WriteLine($"classes: {classes.Count}; median width {median:0.00} ppm; widest {classes[^1].Width:0.00} ppm: {classes[^1].Text}");
        output.WriteLine($"C–H classes: {carbon.Count}; median width {Median(carbon.Select(c => c.Width).ToList()):0.00} ppm; widest {carbon[^1].Width:0.00} ppm: {carbon[^1].Text}");
        Assert.True(median <= 1.0, $"median width {median:0.00} ppm");
    }

    private static double Median(List<double> sorted) =>
        sorted.Count % 2 == 1 ? sorted[sorted.Count / 2] : (sorted[(sorted.Count / 2) - 1] + sorted[sorted.Count / 2]) / 2;

    private static IEnumerable<(string Name, string Group, string Solvent, double Ppm, string Source, ShiftPrediction Prediction)> Cases()
    {
        foreach (var impurity in ImpurityTable.All)
        {
            var (smiles, groups) = ImpurityAtomMap.Map[impurity.Name];
            foreach (var group in impurity.Groups)
            {
                foreach (var shift in group.Shifts.Where(s => s.Nucleus == Nucleus.H1 && Solvents.Contains(s.Solvent)))
                {
                    foreach (var atom in groups[group.Label])
                    {
                        var prediction = ProtonWindows.For(smiles ?? impurity.Smiles!, atom, shift.Solvent);
                        yield return (impurity.Name, group.Label, shift.Solvent, shift.Ppm, shift.Source.ToString(), prediction);
                    }
                }
            }
        }

        foreach (var line in ResidualSolventTable.Lines.Where(l => l.Kind == SolventLineKind.Water && Solvents.Contains(l.Solvent)))
        {
            yield return ("water", "H2O", line.Solvent, line.ShiftPpm, line.Source.ToString(), ProtonWindows.For("O", 0, line.Solvent));
        }
    }
}
