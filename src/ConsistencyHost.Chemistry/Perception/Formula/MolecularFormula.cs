using System.Collections.Immutable;
using System.Globalization;
using System.Text;
using ConsistencyHost.Chemistry.Model;

namespace ConsistencyHost.Chemistry.Perception.Formula;

/// <summary>An elemental formula with net charge, Hill-order text and masses.</summary>
/// <remarks>
/// Hill order (Hill, J. Am. Chem. Soc. 22, 478, 1900): with carbon, C then H then the rest alphabetically;
/// without carbon, everything alphabetically. Charge is appended as "+", "-", "+2", "-3".
/// Isotopically labelled atoms count under their element in the text (as most journals' formulae do) but
/// their nuclide mass is used in <see cref="MonoisotopicMass"/>.
/// </remarks>
public sealed record MolecularFormula
{
    /// <summary>Electron mass, u. CODATA 2018: 5.48579909065(16)e-4 u (nmr-data-standards.md §7.2).</summary>
    public const double ElectronMass = 0.000548579909065;

    internal MolecularFormula(ImmutableSortedDictionary<string, int> counts, int charge, double mono, double average)
    {
        Counts = counts;
        Charge = charge;
        AtomMassSum = mono;
        AverageMass = average;
    }

    /// <summary>Element symbol → count (hydrogens included).</summary>
    public ImmutableSortedDictionary<string, int> Counts { get; }

    /// <summary>Net formal charge.</summary>
    public int Charge { get; }

    /// <summary>Monoisotopic mass of the species as written, u: nuclide masses (most abundant nuclide unless an
    /// isotope is given) minus one electron mass per positive charge (plus one per negative charge), the HRMS
    /// convention of nmr-data-standards.md §7.3 (and RDKit's ExactMolWt). Divide by |charge| for m/z.</summary>
    public double MonoisotopicMass => AtomMassSum - (Charge * ElectronMass);

    /// <summary>Sum of the neutral-atom nuclide masses, u, without the electron correction for the charge.</summary>
    public double AtomMassSum { get; }

    /// <summary>Sum of conventional standard atomic weights (CIAAW).</summary>
    public double AverageMass { get; }

    /// <summary>Hill-order text, e.g. "C8H10N4O2", "C2H7N+".</summary>
    public string Hill => HillText(Counts, Charge);

    /// <inheritdoc />
    public override string ToString() => Hill;

    /// <summary>This formula plus <paramref name="other"/> (counts and charges add), e.g. M + H+ for [M+H]+.</summary>
    public MolecularFormula Plus(MolecularFormula other)
    {
        ArgumentNullException.ThrowIfNull(other);
        var counts = new Dictionary<string, int>(Counts, StringComparer.Ordinal);
        foreach (var (symbol, n) in other.Counts)
        {
            counts[symbol] = counts.GetValueOrDefault(symbol) + n;
        }

        return FormulaCalculator.FromCounts(counts, Charge + other.Charge);
    }

    /// <summary>The same atoms with another net charge (the mass follows the electron count).</summary>
    public MolecularFormula WithCharge(int charge) => FormulaCalculator.FromCounts(Counts, charge);

    /// <summary>Same element counts and charge (masses follow; isotopic labels are not compared).</summary>
    public bool Equals(MolecularFormula? other) =>
        other is not null && Charge == other.Charge && Counts.SequenceEqual(other.Counts);

    /// <inheritdoc />
    public override int GetHashCode() => HashCode.Combine(Hill);

    /// <summary>The formula of a molecule, counting implicit and folded hydrogens.</summary>
    public static MolecularFormula Of(Molecule molecule) => FormulaCalculator.Of(molecule);

    /// <summary>Parses "C10H15NO2", "C2H7N+", "C12H15NO3Na", "CuO4S-2"; null and a message when malformed.</summary>
    public static (MolecularFormula? Formula, string? Error) Parse(string text) => FormulaParser.Parse(text);

    internal static string HillText(IReadOnlyDictionary<string, int> counts, int charge)
    {
        var sb = new StringBuilder();
        var hasCarbon = counts.ContainsKey("C");
        if (hasCarbon)
        {
            Append(sb, "C", counts["C"]);
            if (counts.TryGetValue("H", out var h))
            {
                Append(sb, "H", h);
            }
        }

        foreach (var (symbol, n) in counts.OrderBy(kv => kv.Key, StringComparer.Ordinal))
        {
            if (!hasCarbon || (symbol != "C" && symbol != "H"))
            {
                Append(sb, symbol, n);
            }
        }

        if (charge != 0)
        {
            sb.Append(charge > 0 ? '+' : '-');
            if (Math.Abs(charge) > 1)
            {
                sb.Append(Math.Abs(charge).ToString(CultureInfo.InvariantCulture));
            }
        }

        return sb.ToString();
    }

    private static void Append(StringBuilder sb, string symbol, int n)
    {
        sb.Append(symbol);
        if (n != 1)
        {
            sb.Append(n.ToString(CultureInfo.InvariantCulture));
        }
    }
}
