namespace ConsistencyHost.Spectra.Reported;

/// <summary>Recognises free-text notes inside signal details ("minor rotamer", "exchangeable with D2O").</summary>
/// <remarks>Vocabulary from published experimental sections (Common practice); every word of a note must be known,
/// so a misspelt multiplicity is reported rather than silently kept as a note.</remarks>
internal static class SignalNotes
{
    private static readonly HashSet<string> KeyWords = new(StringComparer.OrdinalIgnoreCase)
    {
        "rotamer", "rotamers", "rotamer)", "diastereomer", "diastereomers", "isomer", "isomers", "conformer",
        "conformers", "tautomer", "exchangeable", "exchanged", "exchanges", "overlapped", "overlapping", "overlaps",
        "obscured", "minor", "major", "broad", "ovl", "ovl.", "*", "observed", "mixture", "rotameric", "broadened",
    };

    private static readonly HashSet<string> Fillers = new(StringComparer.OrdinalIgnoreCase)
    {
        "with", "by", "d2o", "solvent", "signal", "signals", "peak", "peaks", "residual", "water", "partially",
        "in", "the", "of", "and", "due", "to", "doubled", "not", "observed", "visible", "hdo", "cdcl3", "dmso-d6",
        "form", "e", "z", "(e)", "(z)", "on", "addition", "chcl3", "h2o", "dmso", "acetone", "isomer)",
        // "rotamer A", "OH not observed", "cis-trans mixture", "hydroxyl signal was not observed" (common practice).
        "a", "b", "oh", "nh", "nh2", "cooh", "co2h", "sh", "hydroxyl", "amine", "amide", "acid", "was", "were", "is",
        "are", "cis", "trans", "cis-trans", "cis/trans", "ratio", "two", "as", "at", "rt", "proton", "protons", "also",
    };

    /// <summary>"3:1", "55:45" as in "rotamers 3:1".</summary>
    private static bool IsRatio(string word)
    {
        var colon = word.IndexOf(':');
        return colon > 0 && colon < word.Length - 1 && word.Remove(colon, 1).All(char.IsAsciiDigit);
    }

    /// <summary>"4.33/4.22" as in "rotamers 4.33/4.22": two shifts of one environment.</summary>
    private static bool IsShiftPair(string word)
    {
        var slash = word.IndexOf('/');
        return slash > 0 && slash < word.Length - 1 && word.All(ch => char.IsAsciiDigit(ch) || ch is '.' or '/');
    }

    /// <summary>True for a note; "minor rotamer: 4.02 (s)" is one when the words before the colon are.</summary>
    public static bool IsNote(string text)
    {
        var colon = text.IndexOf(':');
        if (colon > 0 && !char.IsAsciiDigit(text[colon - 1])) return IsWordsNote(text[..colon]);
        return IsWordsNote(text);
    }

    private static bool IsWordsNote(string text)
    {
        var words = text.Split(' ', StringSplitOptions.RemoveEmptyEntries);
        var hasKey = false;
        foreach (var word in words)
        {
            if (KeyWords.Contains(word)) hasKey = true;
            else if (!Fillers.Contains(word) && !IsRatio(word) && !IsShiftPair(word)) return false;
        }
        return hasKey;
    }
}
