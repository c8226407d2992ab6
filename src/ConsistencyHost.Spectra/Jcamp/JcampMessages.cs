namespace ConsistencyHost.Spectra.Jcamp;

/// <summary>Every expectation and message of the JCAMP-DX reader; tests refer to these.</summary>
public static class JcampMessages
{
    public const string ExpectedLabelEquals = "'##LABEL= value' (a label followed by '=')";
    public const string ExpectedTitleFirst = "'##TITLE=' as the first record of a block";
    public const string ExpectedEnd = "'##END=' closing the block";
    public const string ExpectedVariableList = "a variable list (XY..XY), (XYW..XYW), (XYM..XYM), (XYA), (XYWA) or (XYMA)";
    public const string ExpectedNumber = "a number";
    public const string ExpectedTupleSize = "a complete tuple of the declared variable list";
    public const string ExpectedAssignmentTuple = "one assignment tuple per line, such as (2.05, 300.0, <H1>)";
    public const string ExpectedKnownXUnits = "XUNITS of PPM or HZ";
    public const string ExpectedObserveFrequency = "'##.OBSERVE FREQUENCY=' in MHz, needed to convert HZ to ppm";
    public const string ExpectedNpoints = "as many tuples as '##NPOINTS=' declares";
    public const string ExpectedNucleus = "'##.OBSERVE NUCLEUS=' naming ^1H, ^13C, ^19F or ^31P";
    public const string ExpectedPeakTable = "a peak table (##PEAK TABLE= or ##PEAK ASSIGNMENTS=); full spectra (XYDATA, NTUPLES) are not read";
    public const string ExpectedShorterText = "a text within the length limit";

    /// <summary>The sentence for a problem at a line and column.</summary>
    public static string Describe(int line, int column, string fragment, string expected) => fragment.Length == 0
        ? $"Line {line}, column {column}: expected {expected}, but the line or text ended."
        : $"Line {line}, column {column}: found '{fragment}', but expected {expected}.";

    /// <summary>The sentence for an over-long text.</summary>
    public static string TextTooLong(int length, int limit) =>
        $"The JCAMP-DX text is {length} characters long; at most {limit} characters are read.";
}
