namespace ConsistencyHost.Spectra.Model;

/// <summary>
/// A multiplicity as reported ("dd", "br s", "app t", "ABq", "m") with its first-order reading: the line count
/// of each splitting (d = 2, t = 3, q = 4, quint = 5, sext = 6, sept = 7, oct = 8, non = 9) in the order written.
/// </summary>
/// <remarks>
/// Vocabulary from the journal conventions collected in docs/spectra.md (ACS guideline text, Acta Chim. Slov.
/// style page, published PMC tables). Equality compares the reading, not the spelling: "bs" equals "br s".
/// </remarks>
public readonly record struct Multiplicity
{
    private readonly IReadOnlyList<int>? components;

    internal Multiplicity(string reported, int[] components, MultiplicityFlags flags, string? secondOrder)
    {
        Reported = reported;
        // Read-only view: parsed values are shared through ParsedMultiplicities, so no caller may change them.
        this.components = components.Length == 0 ? [] : Array.AsReadOnly(components);
        Flags = flags;
        SecondOrderLabel = secondOrder;
    }

    /// <summary>The text as reported, trimmed.</summary>
    public string Reported { get; } = "";

    /// <summary>Line count of each first-order splitting in written order; empty for s, m and second-order labels.</summary>
    public IReadOnlyList<int> Components => components ?? [];

    /// <summary>Modifiers and kinds read from the text.</summary>
    public MultiplicityFlags Flags { get; }

    /// <summary>A second-order label ("AB", "ABq", "ABX", "AA'BB'") kept as reported; null otherwise.</summary>
    public string? SecondOrderLabel { get; }

    /// <summary>True when the text was read as a multiplicity at all.</summary>
    public bool IsRecognised => (Flags & MultiplicityFlags.Recognised) != 0;

    /// <summary>True for s (also br s, bs, ls).</summary>
    public bool IsSinglet => (Flags & MultiplicityFlags.Singlet) != 0;

    /// <summary>True for br, bs, br. and the French ls (large singulet).</summary>
    public bool IsBroad => (Flags & MultiplicityFlags.Broad) != 0;

    /// <summary>True for app / apparent and pseudo (pt, ps t, pseudo-t).</summary>
    public bool IsApparent => (Flags & MultiplicityFlags.Apparent) != 0;

    /// <summary>True for m, multiplet, c (complex), overlapped, and partly resolved patterns (dm, tm, qm) whose
    /// resolved splittings stay in <see cref="Components"/>.</summary>
    public bool IsMultiplet => (Flags & MultiplicityFlags.Multiplet) != 0;

    /// <summary>A first-order pattern whose J count can be checked: recognised, not m, not second order.</summary>
    public bool IsFirstOrder => IsRecognised && !IsMultiplet && SecondOrderLabel is null;

    /// <summary>
    /// Number of distinct J values a first-order pattern implies (dd → 2, td → 2, s → 0); null for m,
    /// second-order labels and unrecognised text. Broad and apparent patterns still answer; rules decide
    /// whether to trust them (Common practice: app/br disable strict J-count checks).
    /// </summary>
    public int? ExpectedCouplingCount() => IsFirstOrder ? Components.Count : null;

    /// <summary>One canonical spelling: "br s", "app dd", "quint", "m", "ABq".</summary>
    public string Canonical => MultiplicityText.Canonical(this);

    /// <summary>Reads a reported multiplicity; never throws (unrecognised text gives IsRecognised false).</summary>
    public static Multiplicity Parse(string? text) => ParsedMultiplicities.Get(text ?? "");

    /// <summary>Reads a reported multiplicity; false when the text is not one.</summary>
    public static bool TryParse(string? text, out Multiplicity multiplicity)
    {
        multiplicity = Parse(text);
        return multiplicity.IsRecognised;
    }

    /// <summary>Equal when the readings are equal (flags, components, second-order label).</summary>
    public bool Equals(Multiplicity other) =>
        Flags == other.Flags && SecondOrderLabel == other.SecondOrderLabel
        && Components.SequenceEqual(other.Components);

    /// <inheritdoc />
    public override int GetHashCode() => HashCode.Combine(Flags, SecondOrderLabel, Components.Count);

    /// <inheritdoc />
    public override string ToString() => Canonical;
}

/// <summary>What a multiplicity text said beyond its line counts.</summary>
[Flags]
public enum MultiplicityFlags
{
    /// <summary>Nothing recognised.</summary>
    None = 0,
    /// <summary>The text is a multiplicity.</summary>
    Recognised = 1,
    /// <summary>Singlet.</summary>
    Singlet = 2,
    /// <summary>Broad (br, b, broad, ls).</summary>
    Broad = 4,
    /// <summary>Apparent (app, apparent).</summary>
    Apparent = 8,
    /// <summary>Unresolved multiplet (m, c, complex, overlapped), or a partly resolved one (dm, tm, qm).</summary>
    Multiplet = 16,
}
