using System.Globalization;
using ConsistencyHost.Chemistry.Perception.Symmetry;
using ConsistencyHost.Spectra.Model;
using ConsistencyHost.Spectra.Solvents;

namespace ConsistencyHost.StreamBench.Generation;

/// <summary>
/// Journal-style peak lines in CDCl3 for a generated entry (invented demo data for load only). Signals are
/// kept apart from each other and from the residual CHCl3 lines of CDCl3 (ResidualSolventTable), so that a
/// generated entry reads as a clean one rather than as a solvent mix-up.
/// </summary>
internal static class PeakLines
{
    private const double ProtonGap = 0.04;
    private const double CarbonGap = 0.4;

    private static readonly double[] ResidualProton = Residual(Nucleus.H1);
    private static readonly double[] ResidualCarbon = Residual(Nucleus.C13);

    public static string Proton(NmrEquivalence equivalence, ShiftGuesses guesses)
    {
        var taken = new List<double>();
        var signals = equivalence.HydrogenClasses
            .Select(c => (Shift: Place(guesses.Proton(c.ParentAtoms[0], c.IsExchangeable), taken, ResidualProton, ProtonGap), Class: c))
            .OrderByDescending(s => s.Shift)
            .Select(s => string.Create(CultureInfo.InvariantCulture, $"{s.Shift:0.00} ({Multiplicity(s.Class)}, {s.Class.ParentAtoms.Length}H)"));
        return $"1H NMR (400 MHz, CDCl3) δ {string.Join(", ", signals)}.";
    }

    public static string Carbon(NmrEquivalence equivalence, ShiftGuesses guesses)
    {
        var taken = new List<double>();
        var lines = equivalence.CarbonClasses13C
            .Select(c => Place(guesses.Carbon(c[0]), taken, ResidualCarbon, CarbonGap))
            .OrderByDescending(s => s)
            .Select(s => s.ToString("0.0", CultureInfo.InvariantCulture));
        return $"13C NMR (101 MHz, CDCl3) δ {string.Join(", ", lines)}.";
    }

    private static string Multiplicity(HydrogenClass c) =>
        c.IsExchangeable ? "br s" : c.Vicinal3J.Length == 0 && c.Geminal2J.Length == 0 ? "s" : "m";

    /// <summary>The nearest free shift to the wanted one, stepping outwards by the gap.</summary>
    private static double Place(double wanted, List<double> taken, double[] residual, double gap)
    {
        for (var step = 0; ; step++)
        {
            var candidate = Math.Round(wanted + (step % 2 == 0 ? 1 : -1) * ((step + 1) / 2) * gap, 2);
            if (taken.All(t => Math.Abs(t - candidate) >= gap) && residual.All(r => Math.Abs(r - candidate) >= gap))
            {
                taken.Add(candidate);
                return candidate;
            }
        }
    }

    private static double[] Residual(Nucleus nucleus) =>
        [.. ResidualSolventTable.For("CDCl3", nucleus).Where(l => l.Kind == SolventLineKind.Residual).Select(l => l.ShiftPpm)];
}
