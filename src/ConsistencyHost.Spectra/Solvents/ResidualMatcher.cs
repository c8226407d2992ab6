using ConsistencyHost.Spectra.Model;

namespace ConsistencyHost.Spectra.Solvents;

/// <summary>
/// Finds reported signals that sit on the residual solvent line, on water/HOD, or on a group of a common impurity.
/// </summary>
/// <remarks>Tables: Gottlieb et al. 1997; Fulmer et al. 2010 (see <see cref="ResidualSolventTable"/>, <see cref="ImpurityTable"/>).
/// A range signal matches when the tabulated shift lies inside the range widened by the window.</remarks>
public sealed class ResidualMatcher
{
    private readonly ResidualMatchOptions options;
    private readonly ShiftWindow protonLine;
    private readonly ShiftWindow carbonLine;
    private readonly ShiftWindow exchangeableGroup;

    /// <summary>A matcher with <paramref name="options"/> (the documented defaults when null).</summary>
    public ResidualMatcher(ResidualMatchOptions? options = null)
    {
        this.options = options ?? ResidualMatchOptions.Default;
        protonLine = Symmetric(this.options.ProtonWindowPpm, "1H residual or C–H impurity line");
        carbonLine = Symmetric(this.options.CarbonWindowPpm, "13C line");
        exchangeableGroup = Symmetric(this.options.ExchangeableImpurityWindowPpm, "exchangeable impurity group");
    }

    /// <summary>Matches the signals of <paramref name="spectrum"/> using its nucleus and solvent.</summary>
    public ResidualMatchResult Match(Spectrum spectrum)
    {
        ArgumentNullException.ThrowIfNull(spectrum);
        return Match(spectrum.Nucleus, spectrum.Solvent, spectrum.Signals);
    }

    /// <summary>Matches <paramref name="signals"/> of a <paramref name="nucleus"/> spectrum in <paramref name="solvent"/>.</summary>
    public ResidualMatchResult Match(Nucleus nucleus, string? solvent, IReadOnlyList<Signal> signals)
    {
        var name = SolventNames.Normalise(solvent);
        if (name is null || SolventRows.For(name, nucleus) is not { } rows) return new ResidualMatchResult { SolventKnown = false };
        var matches = new List<ResidualMatch>();
        var evidence = new List<ImpurityEvidence>();
        for (var i = 0; i < signals.Count; i++) MatchSolventLines(i, signals[i], rows.Lines, name, matches);
        foreach (var impurity in rows.Impurities) MatchImpurity(impurity, nucleus, signals, matches, evidence);
        return new ResidualMatchResult
        {
            SolventKnown = true,
            Matches = [.. matches.OrderBy(m => m.SignalIndex)],
            Impurities = evidence,
        };
    }

    /// <summary>
    /// The signals of <paramref name="spectrum"/> on the residual line of its own solvent (not water, not
    /// impurities): what a rule that judges only the compound's lines leaves out.
    /// </summary>
    public bool[] OnSolventLine(Spectrum spectrum)
    {
        ArgumentNullException.ThrowIfNull(spectrum);
        var on = new bool[spectrum.Signals.Count];
        var name = SolventNames.Normalise(spectrum.Solvent);
        if (name is null || SolventRows.For(name, spectrum.Nucleus) is not { } rows) return on;
        for (var i = 0; i < on.Length; i++)
        {
            foreach (var line in rows.Lines)
            {
                if (line.Kind == SolventLineKind.Residual && Deviation(spectrum.Signals[i], line.ShiftPpm, WindowFor(line, name)) is not null) on[i] = true;
            }
        }

        return on;
    }

    private void MatchSolventLines(int index, Signal signal, ResidualSolventLine[] lines, string solvent, List<ResidualMatch> into)
    {
        foreach (var line in lines)
        {
            if (Deviation(signal, line.ShiftPpm, WindowFor(line, solvent)) is not { } deviation) continue;
            var kind = line.Kind == SolventLineKind.Water ? ResidualMatchKind.Water : ResidualMatchKind.ResidualSolvent;
            into.Add(new ResidualMatch(index, kind, solvent, line.Species, line.ShiftPpm, deviation, line.Source));
        }
    }

    private ShiftWindow WindowFor(ResidualSolventLine line, string solvent)
    {
        if (line.Nucleus == Nucleus.C13) return carbonLine;
        // HOD is the residual line of D2O itself, and it behaves as water does (temperature only).
        var water = line.Kind == SolventLineKind.Water || solvent == "D2O";
        if (!water) return protonLine;
        return options.WaterWindows.TryGetValue(solvent, out var window) ? window : WaterWindowTable.General;
    }

    private static ShiftWindow Symmetric(double ppm, string what) => new(ppm, ppm, what);

    private void MatchImpurity(SolventRows.ImpurityRows impurity, Nucleus nucleus, IReadOnlyList<Signal> signals,
        List<ResidualMatch> into, List<ImpurityEvidence> evidence)
    {
        var tabulated = impurity.Shifts.Length;
        var matched = 0;
        foreach (var (group, shift) in impurity.Shifts)
        {
            var window = nucleus == Nucleus.C13 ? carbonLine : group.Exchangeable ? exchangeableGroup : protonLine;
            var hit = false;
            for (var i = 0; i < signals.Count; i++)
            {
                if (Deviation(signals[i], shift.Ppm, window) is not { } deviation) continue;
                into.Add(new ResidualMatch(i, ResidualMatchKind.Impurity, impurity.Impurity.Name, group.Label, shift.Ppm, deviation, shift.Source));
                hit = true;
            }
            if (hit) matched++;
        }
        if (matched > 0) evidence.Add(new ImpurityEvidence(impurity.Impurity, matched, tabulated, matched >= options.MinimumImpurityGroups));
    }

    /// <summary>Signed deviation when the signal lies within the window of <paramref name="reference"/>; null otherwise.</summary>
    private static double? Deviation(Signal signal, double reference, ShiftWindow window)
    {
        if (signal.ShiftPpm is { } x) return window.Contains(reference, x) ? Math.Round(x - reference, 6) : null;
        if (signal.RangeLowPpm is not { } low || signal.RangeHighPpm is not { } high) return null;
        return window.Overlaps(reference, low, high) ? 0 : null;
    }
}
