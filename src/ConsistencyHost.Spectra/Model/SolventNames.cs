namespace ConsistencyHost.Spectra.Model;

/// <summary>Normalises the ways chemists write deuterated solvents to one name per solvent.</summary>
/// <remarks>Canonical names follow Gottlieb et al. 1997 and Fulmer et al. 2010 (CDCl3, DMSO-d6, CD3OD …).</remarks>
public static class SolventNames
{
    /// <summary>The canonical names this class produces.</summary>
    public static readonly IReadOnlyList<string> Canonical =
        ["CDCl3", "DMSO-d6", "CD3OD", "D2O", "acetone-d6", "C6D6", "CD3CN", "CD2Cl2", "THF-d8", "toluene-d8"];

    // Common practice: spellings seen in experimental sections; keys are compared after Key() folding.
    private static readonly Dictionary<string, string> Aliases = new(StringComparer.Ordinal)
    {
        ["cdcl3"] = "CDCl3", ["chloroformd"] = "CDCl3", ["chloroformd1"] = "CDCl3", ["deuterochloroform"] = "CDCl3",
        ["dmsod6"] = "DMSO-d6", ["d6dmso"] = "DMSO-d6", ["(cd3)2so"] = "DMSO-d6", ["cd3socd3"] = "DMSO-d6",
        ["dimethylsulfoxided6"] = "DMSO-d6", ["dmso"] = "DMSO-d6",
        ["cd3od"] = "CD3OD", ["methanold4"] = "CD3OD", ["d4methanol"] = "CD3OD", ["meodd4"] = "CD3OD", ["cd3od4"] = "CD3OD",
        ["d2o"] = "D2O", ["deuteriumoxide"] = "D2O",
        ["acetoned6"] = "acetone-d6", ["d6acetone"] = "acetone-d6", ["(cd3)2co"] = "acetone-d6", ["cd3cocd3"] = "acetone-d6",
        ["c6d6"] = "C6D6", ["benzened6"] = "C6D6", ["d6benzene"] = "C6D6",
        ["cd3cn"] = "CD3CN", ["acetonitriled3"] = "CD3CN", ["d3acetonitrile"] = "CD3CN",
        ["cd2cl2"] = "CD2Cl2", ["dichloromethaned2"] = "CD2Cl2", ["methylenechlorided2"] = "CD2Cl2",
        ["thfd8"] = "THF-d8", ["d8thf"] = "THF-d8", ["tetrahydrofurand8"] = "THF-d8",
        ["toluened8"] = "toluene-d8", ["d8toluene"] = "toluene-d8", ["c7d8"] = "toluene-d8",
    };

    /// <summary>The canonical name, or null when the text names no solvent this class knows.</summary>
    public static string? Normalise(string? text) =>
        text is not null && Aliases.TryGetValue(Key(text), out var name) ? name : null;

    /// <summary>True when <paramref name="text"/> names a known solvent; <paramref name="name"/> is canonical.</summary>
    public static bool TryNormalise(string? text, out string name)
    {
        name = Normalise(text) ?? "";
        return name.Length > 0;
    }

    /// <summary>Lower case, subscript digits folded, blanks, hyphens and underscores removed.</summary>
    private static string Key(string text)
    {
        var buffer = new System.Text.StringBuilder(text.Length);
        foreach (var c in text.Trim())
        {
            if (c is ' ' or '-' or '_' or '‐' or '–' or '\u00A0') continue;
            buffer.Append(c is >= '₀' and <= '₉' ? (char)('0' + (c - '₀')) : char.ToLowerInvariant(c));
        }
        return buffer.ToString();
    }
}
