namespace ConsistencyHost.Spectra.Model;

/// <summary>Hand-written reader and writer for multiplicity text (no regular expressions).</summary>
internal static class MultiplicityText
{
    // Common practice: names a splitting may be written with; longest first so "quint" wins over "q".
    private static readonly (string Name, int Lines)[] Names =
    [
        ("quintet", 5), ("pentet", 5), ("sextet", 6), ("hextet", 6), ("septet", 7), ("heptet", 7),
        ("doublet", 2), ("triplet", 3), ("quartet", 4), ("octet", 8), ("nonet", 9),
        ("quint", 5), ("pent", 5), ("sext", 6), ("sept", 7), ("hept", 7), ("hex", 6), ("oct", 8), ("non", 9),
        ("d", 2), ("t", 3), ("q", 4), ("p", 5),
    ];

    public static Multiplicity Parse(string text)
    {
        var reported = text.Trim();
        if (reported.Length > 0 && !reported.Contains(' ')) return ReadCoreOrModifier(reported);
        var flags = MultiplicityFlags.None;
        var words = reported.Split(' ', StringSplitOptions.RemoveEmptyEntries);
        var core = new List<string>();
        foreach (var word in words)
        {
            var modifier = ModifierOf(word);
            if (modifier != MultiplicityFlags.None && (core.Count == 0 || word.StartsWith('('))) flags |= modifier;
            else core.Add(word);
        }
        if (core.Count == 0) return Unrecognised(reported);
        var spaced = string.Join(' ', core);
        // "AB quartet" keeps its blank; "sept d", "sept of d", "d of d", "doublet of doublets" read as one word.
        return IsSecondOrder(spaced) ? ReadCore(reported, spaced, flags) : ReadCore(reported, Joined(core), flags);
    }

    /// <summary>The core words without "of", plurals made singular ("doublets" → "doublet"), run together.</summary>
    private static string Joined(List<string> core)
    {
        // "d of" or "of d" is a fragment, not a pattern.
        if (Lower(core[0]) == "of" || Lower(core[^1]) == "of") return "";
        var joined = "";
        foreach (var word in core)
        {
            var lower = Lower(word);
            if (lower == "of") continue;
            joined += lower.Length > 2 && lower[^1] == 's' && IsName(lower[..^1]) ? lower[..^1] : lower;
        }
        return joined;
    }

    private static bool IsName(string word)
    {
        foreach (var (name, _) in Names)
            if (name == word) return true;
        return false;
    }

    /// <summary>Fast path for one word (most multiplicities); a lone "app" is not a multiplicity.</summary>
    private static Multiplicity ReadCoreOrModifier(string word) => ModifierOf(word) switch
    {
        // Common practice: "(br, 1H)" reports a broad, unresolved signal (NH, OH); read as broad m.
        MultiplicityFlags.Broad => Make(word, [], MultiplicityFlags.Broad | MultiplicityFlags.Multiplet),
        MultiplicityFlags.None => ReadCore(word, word, MultiplicityFlags.None),
        _ => Unrecognised(word),
    };

    // Common practice: "ps t", "pseudo t" (pseudo-triplet) say what "app t" says: the n + 1 reading is apparent.
    private static MultiplicityFlags ModifierOf(string word) => Lower(word) switch
    {
        "br" or "br." or "b" or "broad" or "(br)" or "(br.)" or "(broad)" => MultiplicityFlags.Broad,
        "app" or "app." or "apparent" or "(app)" or "ps" or "ps." or "pseudo" => MultiplicityFlags.Apparent,
        _ => MultiplicityFlags.None,
    };

    private static Multiplicity ReadCore(string reported, string core, MultiplicityFlags flags)
    {
        if (IsSecondOrder(core)) return new(reported, [], flags | MultiplicityFlags.Recognised, core);
        var lower = Lower(core);
        switch (lower)
        {
            case "s" or "singlet":
                return Make(reported, [], flags | MultiplicityFlags.Singlet);
            case "bs" or "brs" or "br.s" or "ls" or "sl" or "bs.":
                return Make(reported, [], flags | MultiplicityFlags.Singlet | MultiplicityFlags.Broad);
            case "m" or "multiplet" or "c" or "complex" or "overlapped" or "ovl" or "ovl." or "mc":
                return Make(reported, [], flags | MultiplicityFlags.Multiplet);
            case "bm" or "brm":
                return Make(reported, [], flags | MultiplicityFlags.Multiplet | MultiplicityFlags.Broad);
        }
        // "bd", "bt", "brd", "brt": broad with the blank left out (common practice).
        if (lower.Length >= 2 && lower[0] == 'b' && lower[1] != 'r' && Components(lower[1..]) is { } broad)
            return Make(reported, broad, flags | MultiplicityFlags.Broad);
        if (lower.Length >= 3 && lower.StartsWith("br", StringComparison.Ordinal) && Components(lower[2..]) is { } glued)
            return Make(reported, glued, flags | MultiplicityFlags.Broad);
        if (lower == "pt") return Make(reported, [3], flags | MultiplicityFlags.Apparent);
        return Components(lower) is { } parts ? Make(reported, parts, flags) : ReadPseudoOrPartial(reported, lower, flags);
    }

    /// <summary>
    /// "pseudo-t", "ps-t" (pseudo-triplet: apparent t; "pt" is read before the splittings) and a partly resolved
    /// pattern "dm", "tm", "qm", "ddm" (resolved splittings of an unresolved multiplet: no first-order J count).
    /// </summary>
    /// <remarks>Common practice in experimental sections; "pt" is read as pseudo-triplet because a quintet of
    /// triplets is written "quintt" or "tquint" in practice, while "pt" abbreviates pseudo-triplet.</remarks>
    private static Multiplicity ReadPseudoOrPartial(string reported, string lower, MultiplicityFlags flags)
    {
        foreach (var prefix in PseudoPrefixes)
        {
            if (lower.Length > prefix.Length && lower.StartsWith(prefix, StringComparison.Ordinal))
                return ReadCore(reported, lower[prefix.Length..], flags | MultiplicityFlags.Apparent);
        }
        if (lower.Length > 1 && lower[^1] == 'm' && Components(lower[..^1]) is { } resolved)
            return Make(reported, resolved, flags | MultiplicityFlags.Multiplet);
        return Unrecognised(reported);
    }

    private static readonly string[] PseudoPrefixes = ["pseudo-", "pseudo", "ps-", "ps.", "app-"];

    /// <summary>The text in lower case, without allocating when it already is (the usual case).</summary>
    private static string Lower(string text)
    {
        foreach (var c in text)
            if (char.IsUpper(c)) return text.ToLowerInvariant();
        return text;
    }

    private static Multiplicity Make(string reported, int[] parts, MultiplicityFlags flags) =>
        new(reported, parts, flags | MultiplicityFlags.Recognised, null);

    private static Multiplicity Unrecognised(string reported) => new(reported, [], MultiplicityFlags.None, null);

    /// <summary>Second-order spin-system labels: capitals A–X with primes, optionally "q" or " quartet".</summary>
    private static bool IsSecondOrder(string core)
    {
        var text = core.EndsWith(" quartet", StringComparison.Ordinal) ? core[..^8] : core;
        if (text.EndsWith('q')) text = text[..^1];
        if (text.Length < 2 || text[0] != 'A' || (text[1] != 'B' && text[1] != 'A' && text[1] != 'M')) return false;
        foreach (var c in text)
            if (!(c is >= 'A' and <= 'X' || c is '\'' or '′' or '’' or '₂' or '₃' or '2' or '3')) return false;
        return true;
    }

    private static int[]? Components(string lower)
    {
        var parts = new List<int>();
        var i = 0;
        while (i < lower.Length)
        {
            var matched = false;
            foreach (var (name, lines) in Names)
            {
                if (string.CompareOrdinal(lower, i, name, 0, name.Length) != 0) continue;
                parts.Add(lines);
                i += name.Length;
                matched = true;
                break;
            }
            if (!matched) return null;
        }
        return parts.Count == 0 ? null : [.. parts];
    }

    public static string Canonical(Multiplicity m)
    {
        if (!m.IsRecognised) return m.Reported;
        var prefix = (m.IsBroad ? "br " : "") + (m.IsApparent ? "app " : "");
        if (m.SecondOrderLabel is { } label) return prefix + label;
        if (m.IsSinglet) return prefix + "s";
        if (m.IsMultiplet) return prefix + string.Concat(m.Components.Select(Letter)) + "m";
        return prefix + string.Concat(m.Components.Select(Letter));
    }

    private static string Letter(int lines) => lines switch
    {
        2 => "d", 3 => "t", 4 => "q", 5 => "quint", 6 => "sext", 7 => "sept", 8 => "oct", _ => "non",
    };
}
