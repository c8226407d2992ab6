using System.Globalization;

namespace ConsistencyHost.Chemistry.Smiles;

/// <summary>Every message the SMILES reader can produce. Tests refer to these, never to literal text.</summary>
public static class SmilesMessages
{
    public const string EmptyInput = "The SMILES is empty; expected at least one atom.";
    public const string UnexpectedCharacter = "Unexpected character '{0}'; expected an atom, a bond, a ring-closure digit, '(', ')' or '.'.";
    public const string UnknownElement = "Unknown element symbol '{0}'.";
    public const string UnclosedBracket = "Bracket atom opened here is not closed; expected ']'.";
    public const string BadBracketContent = "Unexpected '{0}' inside a bracket atom; expected isotope, symbol, chirality, H count, charge, class or ']'.";
    public const string UnclosedBranch = "Branch opened here is not closed; expected ')'.";
    public const string UnmatchedCloseBranch = "')' without a matching '('.";
    public const string BranchWithoutAtom = "'(' must follow an atom.";
    public const string EmptyBranch = "Empty branch '()'; expected an atom inside.";
    public const string BondBeforeBranch = "Bond '{0}' written before '('; expected it inside the branch, before its first atom.";
    public const string BranchOpensBranch = "Branch '(' opened directly inside another; expected an atom or a bond after '('.";
    public const string UnclosedRing = "Ring bond {0} opened here is never closed.";
    public const string RingBondConflict = "Ring bond {0} is written with two different bond symbols.";
    public const string RingToSelf = "Ring bond {0} would bond an atom to itself.";
    public const string DuplicateBond = "Ring bond {0} duplicates an existing bond between the same atoms.";
    public const string RingWithoutAtom = "Ring-closure digit must follow an atom.";
    public const string BondWithoutAtom = "Bond symbol '{0}' must follow an atom.";
    public const string DanglingBond = "Bond symbol '{0}' is not followed by an atom.";
    public const string BondBeforeDot = "A bond symbol cannot precede '.'.";
    public const string BadValence = "Atom {0} ({1}) has bond order sum {2}, more than its allowed valence {3}.";
    public const string KekuliseFailed = "Aromatic system containing atom {0} ({1}) cannot be kekulised: no alternating single/double bonds fit; check the aromatic atoms and [nH].";
    public const string ChiralityIgnored = "Chirality mark on atom {0} ignored: it has {1} neighbours (including H), expected 3 or 4.";
    public const string ChiralityClassUnsupported = "Chirality class '{0}' is not supported; only @, @@, @TH1 and @TH2.";
    public const string ConflictingDoubleBondMarks = "Conflicting '/' and '\\' marks at atom {0}: two neighbours on the same side.";

    /// <summary>Formats a message with invariant culture.</summary>
    public static string Format(string template, params object[] args) =>
        string.Format(CultureInfo.InvariantCulture, template, args);
}
