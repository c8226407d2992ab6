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
    // Descriptions, names and atom lists are built only for classes a finding names, once each: several findings
    // may name one class.
    private readonly string?[] _descriptions = new string?[windows.Count];
    private readonly string?[] _names = new string?[windows.Count];
    private readonly IReadOnlyList<int>?[] _atoms = new IReadOnlyList<int>?[windows.Count];
    private readonly string?[] _named = new string?[windows.Count];

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
                    string.Create(CultureInfo.InvariantCulture, $"No reported {nucleus} signal lies in the window of {NameOf(c)}: expected {Describe(c)}."))
                { Atoms = AtomsOf(c), Peaks = [PeakRef.WholeSpectrum(index)] }
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
        var message = string.Create(CultureInfo.InvariantCulture, $"The {nucleus} signal at {spectrum.Signals[signal].Describe()} lies {how} the predicted window of every class of the structure ({distance:0.00} ppm beyond the nearest, {Named(nearest)}).");
        var finding = far
            ? new Finding(ShiftPlausibilityCodes.SignalFarOutside, Severity.Error, message)
            : new Finding(ShiftPlausibilityCodes.SignalJustOutside, Severity.Warning, message);
        return (finding with { Atoms = AtomsOf(nearest), Peaks = [new PeakRef(index, signal)] })
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
            described[k] = Named(assigned[k]);
            var classAtoms = AtomsOf(assigned[k]);
            for (var a = 0; a < classAtoms.Count; a++)
            {
                if (!atoms.Contains(classAtoms[a])) atoms.Add(classAtoms[a]);
            }
        }

        return new Finding(ShiftPlausibilityCodes.AssignedClassOutside, Severity.Info,
                string.Create(CultureInfo.InvariantCulture, $"The {nucleus} signal at {spectrum.Signals[signal].Describe()} fits some class of the structure, but not the class(es) the integrals and patterns assign to it ({string.Join("; ", Distinct(described))})."))
            { Atoms = atoms, Peaks = [new PeakRef(index, signal)] }
            .WithEvidence("window_low", windows[first].Window.Low).WithEvidence("window_high", windows[first].Window.High);
    }

    private ShiftWindow Window(int c) => windows[c].Window.Widened(slackPpm);

    private string NameOf(int c) => _names[c] ??= nameOf(c);

    private IReadOnlyList<int> AtomsOf(int c) => _atoms[c] ??= atomsOf(c);

    private string Describe(int c) => _descriptions[c] ??= Describe(windows[c]);

    /// <summary>"1 H on C4: 7.02–7.86 ppm, most likely …".</summary>
    private string Named(int c) => _named[c] ??= NameOf(c) + ": " + Describe(c);

    private static string Describe(ShiftPrediction p) =>
        string.Create(CultureInfo.InvariantCulture, $"{p.Window.Low:0.0#}–{p.Window.High:0.0#} ppm, most likely {p.Window.MostLikely:0.0#} ({string.Join("; ", p.Reasons)})");

    /// <summary>The phrases in order, each kept at its first occurrence (two classes may share one description).</summary>
    private static List<string> Distinct(string[] phrases)
    {
        var kept = new List<string>(phrases.Length);
        foreach (var phrase in phrases)
        {
            if (!kept.Contains(phrase, StringComparer.Ordinal)) kept.Add(phrase);
        }

        return kept;
    }

    private static (double Low, double High) Span(Signal signal) =>
        signal.ShiftPpm is { } shift ? (shift, shift) : (signal.RangeLowPpm ?? signal.CentrePpm, signal.RangeHighPpm ?? signal.CentrePpm);
}
