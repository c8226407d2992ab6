using System.Collections.Immutable;
using System.Globalization;
using System.Text;
using ConsistencyHost.Chemistry.Perception.Formula;

namespace ConsistencyHost.Rules.MassFormula.Ions;

/// <summary>Element counts with the sum of their neutral-atom (nuclide) masses, before any electron correction.</summary>
/// <param name="Counts">Element symbol → count; no zero entries.</param>
/// <param name="AtomMassSum">Σ neutral-atom masses, u (NIST nuclide masses through the chemistry library).</param>
internal sealed record Composition(ImmutableSortedDictionary<string, int> Counts, double AtomMassSum)
{
    /// <summary>The composition of a formula (its isotopic labels already in the mass).</summary>
    public static Composition Of(MolecularFormula formula) => new(formula.Counts, formula.AtomMassSum);

    /// <summary>This plus <paramref name="factor"/> times <paramref name="other"/> (a negative factor removes).</summary>
    public Composition Plus(Composition other, int factor)
    {
        var counts = Counts.ToBuilder();
        foreach (var (symbol, n) in other.Counts)
        {
            var total = counts.GetValueOrDefault(symbol) + (factor * n);
            if (total == 0) counts.Remove(symbol);
            else counts[symbol] = total;
        }

        return new Composition(counts.ToImmutable(), AtomMassSum + (factor * other.AtomMassSum));
    }

    /// <summary>This many times over (the 2 of "[2M+Na]+").</summary>
    public Composition Times(int factor) => new Composition(ImmutableSortedDictionary<string, int>.Empty, 0).Plus(this, factor);

    /// <summary>The first element whose count went below zero; null when none did.</summary>
    public string? NegativeElement => Counts.FirstOrDefault(kv => kv.Value < 0).Key;

    /// <summary>Same elements in the same numbers (masses are not compared: labels count under their element).</summary>
    public bool SameCounts(Composition other) =>
        Counts.Count == other.Counts.Count && Counts.All(kv => other.Counts.GetValueOrDefault(kv.Key) == kv.Value);

    /// <summary>Element symbols whose counts differ between the two.</summary>
    public IReadOnlySet<string> DifferingElements(Composition other) =>
        Counts.Keys.Union(other.Counts.Keys).Where(s => Counts.GetValueOrDefault(s) != other.Counts.GetValueOrDefault(s)).ToHashSet(StringComparer.Ordinal);

    /// <summary>Hill-order text with a charge suffix ("C8H11N4O2+"), through the library's own formatter.</summary>
    public string Hill(int charge)
    {
        var text = new StringBuilder();
        foreach (var (symbol, n) in Counts)
        {
            text.Append(symbol).Append(n.ToString(CultureInfo.InvariantCulture));
        }

        if (charge != 0)
        {
            // Sign first ("+2"): a leading magnitude would run into the last count ("O2" + "2+" reads as O22).
            text.Append(charge > 0 ? '+' : '-');
            if (Math.Abs(charge) > 1) text.Append(Math.Abs(charge).ToString(CultureInfo.InvariantCulture));
        }

        return MolecularFormula.Parse(text.ToString()).Formula?.Hill ?? text.ToString();
    }
}
