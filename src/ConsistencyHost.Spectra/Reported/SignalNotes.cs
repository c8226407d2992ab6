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
        "obscured", "minor", "major", "broad", "ovl", "ovl.", "*",
    };

    private static readonly HashSet<string> Fillers = new(StringComparer.OrdinalIgnoreCase)
    {
        "with", "by", "d2o", "solvent", "signal", "signals", "peak", "peaks", "residual", "water", "partially",
        "in", "the", "of", "and", "due", "to", "doubled", "not", "observed", "visible", "hdo", "cdcl3", "dmso-d6",
        "form", "e", "z", "(e)", "(z)", "on", "addition", "chcl3", "h2o", "dmso", "acetone", "isomer)",
    };

    /// <summary>"3:1", "55:45" as in "rotamers 3:1".</summary>
    private static bool IsRatio(string word)
    {
        var colon = word.IndexOf(':');
        return colon > 0 && colon < word.Length - 1 && word.Remove(colon, 1).All(char.IsAsciiDigit);
    }

    public static bool IsNote(string text)
    {
        var words = text.Split(' ', StringSplitOptions.RemoveEmptyEntries);
        var hasKey = false;
        foreach (var word in words)
        {
            if (KeyWords.Contains(word)) hasKey = true;
            else if (!Fillers.Contains(word) && !IsRatio(word)) return false;
        }
        return hasKey;
    }
}
