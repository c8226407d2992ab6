namespace ConsistencyHost.Spectra.Model;

/// <summary>The observed nucleus of a one-dimensional spectrum.</summary>
public enum Nucleus
{
    /// <summary>Not stated or not recognised.</summary>
    Unknown = 0,
    /// <summary>Proton.</summary>
    H1,
    /// <summary>Carbon-13 (usually proton-decoupled).</summary>
    C13,
    /// <summary>Fluorine-19.</summary>
    F19,
    /// <summary>Phosphorus-31.</summary>
    P31,
}

/// <summary>Conversions between <see cref="Nucleus"/> and the labels chemists write.</summary>
public static class NucleusNames
{
    /// <summary>The conventional label: 1H, 13C, 19F, 31P.</summary>
    public static string ToLabel(this Nucleus nucleus) => nucleus switch
    {
        Nucleus.H1 => "1H",
        Nucleus.C13 => "13C",
        Nucleus.F19 => "19F",
        Nucleus.P31 => "31P",
        _ => "unknown",
    };

    /// <summary>Reads 1H, H1, ^1H, 13C, 13C{1H}, C13, 19F, 31P (case-insensitive); Unknown otherwise.</summary>
    public static Nucleus Parse(string? label)
    {
        if (string.IsNullOrWhiteSpace(label)) return Nucleus.Unknown;
        var text = label.Trim().TrimStart('^').ToUpperInvariant();
        var brace = text.IndexOf('{');
        if (brace > 0) text = text[..brace];
        return text switch
        {
            "1H" or "H1" or "H" or "PROTON" => Nucleus.H1,
            "13C" or "C13" or "C" or "CARBON" => Nucleus.C13,
            "19F" or "F19" or "F" => Nucleus.F19,
            "31P" or "P31" or "P" => Nucleus.P31,
            _ => Nucleus.Unknown,
        };
    }
}
