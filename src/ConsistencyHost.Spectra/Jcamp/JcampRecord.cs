namespace ConsistencyHost.Spectra.Jcamp;

/// <summary>One text line after comment stripping, with its 1-based number.</summary>
internal readonly record struct JcampLine(int Number, string Text, int ColumnOffset);

/// <summary>One labelled data record: ##LABEL= value, plus the lines that continue it.</summary>
internal sealed record JcampRecord(string Label, string RawLabel, JcampLine Value, IReadOnlyList<JcampLine> Continuation)
{
    /// <summary>Upper case with blanks, hyphens, slashes and underscores removed (JCAMP-DX 4.24 §4.4, from memory; see docs).</summary>
    public static string Normalise(string label)
    {
        var buffer = new System.Text.StringBuilder(label.Length);
        foreach (var c in label)
            if (c is not (' ' or '-' or '/' or '_' or '\t')) buffer.Append(char.ToUpperInvariant(c));
        return buffer.ToString();
    }

    /// <summary>The value with its continuation lines joined by line ends.</summary>
    public string FullValue => Continuation.Count == 0
        ? Value.Text.Trim()
        : string.Join('\n', new[] { Value.Text }.Concat(Continuation.Select(l => l.Text))).Trim();
}
