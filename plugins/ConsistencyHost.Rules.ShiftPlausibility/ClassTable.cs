using System.Globalization;
using ConsistencyHost.Sdk.Findings;
using ConsistencyHost.Spectra.Analysis.Prediction;
using ConsistencyHost.Spectra.Model;

namespace ConsistencyHost.Rules.ShiftPlausibility;

/// <summary>
/// The classes of one nucleus with their predicted windows, and the judgement of a reported list against them:
/// signals no window explains, signals outside the windows of the classes assigned to them, and classes no
/// signal falls into.
/// </summary>
internal sealed class ClassTable(
    string nucleus,
    IReadOnlyList<ShiftPrediction> windows,
    double slackPpm,
    double farPpm,
    Func<int, IReadOnlyList<int>> atomsOf,
    Func<int, string> nameOf,
    Func<int, bool> mustAppear)
{
    // Descriptions are built only for classes a finding names, once each: several findings may name one class.
    private readonly string?[] _descriptions = new string?[windows.Count];

    public IEnumerable<Finding> Judge(Spectrum spectrum, int index, IReadOnlyList<int> counted, Func<int, IReadOnlyList<int>?> assignedTo)
    {
        if (windows.Count == 0 || counted.Count == 0) yield break;
        var explained = new bool[windows.Count];
        foreach (var s in counted)
        {
            var (low, high) = Span(spectrum.Signals[s]);
            var nearest = -1;
            var nearestDistance = double.MaxValue;
            for (var c = 0; c < windows.Count; c++)
            {
                var distance = Window(c).DistanceOutside(low, high);
                if (distance == 0) explained[c] = true;
                if (distance < nearestDistance)
                {
                    nearest = c;
                    nearestDistance = distance;
                }
            }

            if (nearestDistance > 0)
            {
                yield return OutsideEveryWindow(spectrum, index, s, nearest, nearestDistance);
            }
            else if (assignedTo(s) is { Count: > 0 } assigned && OutsideAll(assigned, low, high))
            {
                yield return OutsideAssigned(spectrum, index, s, assigned);
            }
        }

        for (var c = 0; c < windows.Count; c++)
        {
            if (explained[c] || !mustAppear(c)) continue;
            // Info, not warning: a class with no signal in its window is most often an overlapped or unreported
            // line (quaternary 13C, aromatic CH under a multiplet); measured in docs/spectrum-model.md.
            yield return new Finding(ShiftPlausibilityCodes.ClassWithoutSignal, Severity.Info,
                    Text($"No reported {nucleus} signal lies in the window of {nameOf(c)}: expected {Describe(c)}."))
                { Atoms = atomsOf(c), Peaks = [PeakRef.WholeSpectrum(index)] }
                .WithEvidence("window_low", windows[c].Window.Low).WithEvidence("window_high", windows[c].Window.High);
        }
    }

    private bool OutsideAll(IReadOnlyList<int> classes, double low, double high)
    {
        foreach (var c in classes)
        {
            if (Window(c).DistanceOutside(low, high) == 0) return false;
        }

        return true;
    }

    private Finding OutsideEveryWindow(Spectrum spectrum, int index, int signal, int nearest, double distance)
    {
        var far = distance >= farPpm;
        var how = far ? "far outside" : "just outside";
        var message = Text($"The {nucleus} signal at {spectrum.Signals[signal].Describe()} lies {how} the predicted window of every class of the structure ({distance:0.00} ppm beyond the nearest, {nameOf(nearest)}: {Describe(nearest)}).");
        var finding = far
            ? new Finding(ShiftPlausibilityCodes.SignalFarOutside, Severity.Error, message)
            : new Finding(ShiftPlausibilityCodes.SignalJustOutside, Severity.Warning, message);
        return (finding with { Atoms = atomsOf(nearest), Peaks = [new PeakRef(index, signal)] })
            .WithEvidence("distance_ppm", Math.Round(distance, 2)).WithEvidence("nearest_low", windows[nearest].Window.Low).WithEvidence("nearest_high", windows[nearest].Window.High);
    }

    // assigned: distinct class indices in ascending order (see ShiftPlausibilityRule.AssignedClasses).
    private Finding OutsideAssigned(Spectrum spectrum, int index, int signal, IReadOnlyList<int> assigned)
    {
        var first = assigned[0];
        var described = new string[assigned.Count];
        var atoms = new List<int>();
        for (var k = 0; k < assigned.Count; k++)
        {
            described[k] = nameOf(assigned[k]) + ": " + Describe(assigned[k]);
            foreach (var atom in atomsOf(assigned[k]))
            {
                if (!atoms.Contains(atom)) atoms.Add(atom);
            }
        }

        return new Finding(ShiftPlausibilityCodes.AssignedClassOutside, Severity.Info,
                Text($"The {nucleus} signal at {spectrum.Signals[signal].Describe()} fits some class of the structure, but not the class(es) the integrals and patterns assign to it ({string.Join("; ", described.Distinct(StringComparer.Ordinal))})."))
            { Atoms = atoms, Peaks = [new PeakRef(index, signal)] }
            .WithEvidence("window_low", windows[first].Window.Low).WithEvidence("window_high", windows[first].Window.High);
    }

    private ShiftWindow Window(int c) => windows[c].Window.Widened(slackPpm);

    private string Describe(int c) => _descriptions[c] ??= Describe(windows[c]);

    private static string Describe(ShiftPrediction p) =>
        Text($"{p.Window.Low:0.0#}–{p.Window.High:0.0#} ppm, most likely {p.Window.MostLikely:0.0#} ({string.Join("; ", p.Reasons)})");

    private static (double Low, double High) Span(Signal signal) =>
        signal.ShiftPpm is { } shift ? (shift, shift) : (signal.RangeLowPpm ?? signal.CentrePpm, signal.RangeHighPpm ?? signal.CentrePpm);

    private static string Text(FormattableString text) => text.ToString(CultureInfo.InvariantCulture);
}
