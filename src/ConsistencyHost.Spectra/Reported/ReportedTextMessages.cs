namespace ConsistencyHost.Spectra.Reported;

/// <summary>Every expectation and message the reported-text reader produces; tests refer to these.</summary>
public static class ReportedTextMessages
{
    public const string ExpectedHeader =
        "a spectrum header such as '1H NMR (400 MHz, CDCl3) δ' or an HRMS line";
    public const string ExpectedHeaderItem =
        "a frequency (400 MHz), a solvent (CDCl3), a temperature (298 K, 25 °C) or a reference (TMS)";
    public const string ExpectedHeaderClose = "')' closing the header";
    public const string ExpectedSignals = "at least one signal after the header";
    public const string ExpectedShift = "a chemical shift such as 7.26 or a range such as 7.31–7.24";
    public const string ExpectedRangeEnd = "the second shift of the range";
    public const string ExpectedSeparator = "',' or ';' between signals, or '.' after the last one";
    public const string ExpectedDetailsClose = "')' closing the signal details";
    public const string ExpectedDetail =
        "a multiplicity (s, d, dd, m …), a coupling (J = 7.1 Hz), a count (2H), an assignment (H-3) or a note";
    public const string ExpectedOneMultiplicity = "one multiplicity per signal";
    public const string ExpectedOneCount = "one count per signal";
    public const string ExpectedCouplingValue = "a coupling constant in Hz such as 7.1";
    public const string ExpectedCouplingContext = "a multiplicity or 'J =' before a bare coupling value";
    public const string ExpectedCountWithNucleus = "a count with its nucleus such as 3H (a bare number after s or m is not a coupling)";
    public const string ExpectedUnambiguousDecimal =
        "a decimal point (7.26), or decimal commas used from the first shift of the list on (7,26 ; 7,20)";
    public const string ExpectedHrmsCalculated = "'calcd for <ion formula> <m/z>' or 'found <m/z>, <ion formula> requires <m/z>'";
    public const string ExpectedHrmsFormula = "the ion formula after 'calcd for' (such as C10H14NO2)";
    public const string ExpectedHrmsMz = "an m/z value such as 180.1019";
    public const string ExpectedHrmsFound = "'found <m/z>' or the end of the HRMS line";
    public const string ExpectedHrmsRequires = "'requires <m/z>' after the ion formula (as in 'found 182.0810, C9H12NO2 requires 182.0812')";
    public const string ExpectedShorterText = "a text within the length limit";
    public const string ExpectedFewerSignals = "no more signals than the per-spectrum limit";

    /// <summary>The sentence for a problem at <paramref name="offset"/>.</summary>
    public static string Describe(int offset, string fragment, string expected) => fragment.Length == 0
        ? $"At offset {offset} the text ended, but {expected} was expected."
        : $"At offset {offset} found '{fragment}', but {expected} was expected.";

    /// <summary>The sentence for a text over the length limit.</summary>
    public static string TextTooLong(int length, int limit) =>
        $"The text is {length} characters long; at most {limit} characters are read.";

    /// <summary>The sentence for a spectrum over the signal limit.</summary>
    public static string TooManySignals(int offset, int limit) =>
        $"At offset {offset} the spectrum exceeds {limit} signals; the rest of its list is not read.";
}
