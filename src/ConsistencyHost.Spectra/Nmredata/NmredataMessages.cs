namespace ConsistencyHost.Spectra.Nmredata;

/// <summary>Every expectation and message of the NMReDATA reader; tests refer to these.</summary>
public static class NmredataMessages
{
    public const string ExpectedMolEnd = "a MOL block ending with 'M  END' before the data items";
    public const string ExpectedTagHeader = "a data item header such as '>  <NMREDATA_1D_1H>'";
    public const string ExpectedAssignmentLine = "'label, shift, atom[, atom…]' such as 'Ha, 2.0500, H1'";
    public const string ExpectedShift = "a chemical shift (a number such as 4.1200) or a range (7.2000-7.6000)";
    public const string ExpectedAtom = "an atom number of the MOL block, or H<n> for the hydrogens on atom n";
    public const string ExpectedJLine = "'label1, label2, J[, nb=n]' such as 'Hb, Hc, 7.13'";
    public const string ExpectedCoupling = "a coupling in Hz, optionally with its partner label: 7.13 or 7.13(Hc)";
    public const string ExpectedAttribute = "an attribute S=, J=, N=, L=, E=, I=, W=, T1=, T2= or Diff=";
    public const string ExpectedNumber = "a number";
    public const string ExpectedLarmor = "'Larmor=' giving the spectrometer frequency in MHz (mandatory for experimental spectra)";
    public const string ExpectedKnownLabel = "a label defined in NMREDATA_ASSIGNMENT";
    public const string ExpectedBackslash = "a backslash at the end of each line of a multi-line tag (version 1.1 and later)";
    public const string ExpectedTemperature = "a temperature in kelvin such as '298.0 K'";
    public const string ExpectedKnownNucleus = "a 1D tag of 1H, 13C, 19F or 31P";
    public const string ExpectedUniqueTag = "each tag once per record (repeat spectra as NMREDATA_1D_1H#2); the first is used for single-valued tags";
    public const string ExpectedShorterText = "a text within the length limit";

    /// <summary>The sentence for a problem on a line.</summary>
    public static string Describe(int line, string fragment, string expected) => fragment.Length == 0
        ? $"Line {line}: expected {expected}, but the line was empty or the text ended."
        : $"Line {line}: found '{fragment}', but expected {expected}.";

    /// <summary>The sentence for an over-long text.</summary>
    public static string TextTooLong(int length, int limit) =>
        $"The SD text is {length} characters long; at most {limit} characters are read.";
}
