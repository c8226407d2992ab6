using System.Globalization;

namespace ConsistencyHost.Chemistry.Molfile;

/// <summary>Every message the molfile and SD readers can produce. Tests refer to these, never to literal text.</summary>
public static class MolfileMessages
{
    public const string TooShort = "The molfile ends after {0} line(s); expected a 3-line header and a counts line.";
    public const string BadCountsLine = "Counts line is not readable: expected atom and bond counts in columns 1-6 and 'V2000' or 'V3000'.";
    public const string UnknownVersion = "Unknown connection-table version '{0}'; expected V2000 or V3000.";
    public const string MissingAtomLine = "Atom line {0} of {1} is missing; the file ends early.";
    public const string MissingBondLine = "Bond line {0} of {1} is missing; the file ends early.";
    public const string BadNumber = "Expected a number for {0}, found '{1}'.";
    public const string UnknownElement = "Unknown element symbol '{0}'.";
    public const string BadAtomReference = "Bond refers to atom {0}, but there are {1} atoms.";
    public const string SelfBond = "Bond joins atom {0} to itself.";
    public const string BadCharge = "Charge {0} is outside -15 to +15, the range the CTfile format allows.";
    public const string BadMassNumber = "Mass number {0} is outside 1 to 999; expected an isotope's mass number.";
    public const string DuplicateBond = "Bond joins atoms {0} and {1}, already joined by the bond on line {2}; expected one bond per atom pair.";
    public const string UnsupportedBondType = "Bond type {0} is not supported (1, 2, 3 or 4 aromatic); read as single.";
    public const string BadPropertyLine = "Property line '{0}' is malformed: expected a count and that many atom/value pairs.";
    public const string MissingEnd = "No 'M  END' line; expected the connection table to end with it.";
    public const string BadV3000Line = "V3000 line is malformed: {0}.";
    public const string KekuliseFailed = "Aromatic bonds around atom {0} ({1}) cannot be given alternating single/double orders.";
    public const string BadValence = "Atom {0} ({1}) has bond order sum {2}, more than its allowed valence {3}.";
    public const string AmbiguousWedge = "Wedge/hash at atom {0} does not define a configuration (neighbours collinear or flat); ignored.";
    public const string MissingRecordEnd = "SD record starting at line {0} has no '$$$$' terminator.";
    public const string BadDataHeader = "Data header '{0}' is malformed; expected '> <NAME>'.";

    /// <summary>Formats a message with invariant culture.</summary>
    public static string Format(string template, params object[] args) =>
        string.Format(CultureInfo.InvariantCulture, template, args);
}
