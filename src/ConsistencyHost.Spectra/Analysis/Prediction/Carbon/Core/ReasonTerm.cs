using System.Globalization;

namespace ConsistencyHost.Spectra.Analysis.Prediction.Carbon.Core;

/// <summary>How a reason term is written.</summary>
internal enum ReasonKind : byte
{
    /// <summary>"base −2.3".</summary>
    Base,

    /// <summary>"α-OH +49.0" or, for several equal terms, "α C ×2 +18.2" (the total).</summary>
    Increment,

    /// <summary>"±4.5: 3 substituents (increment error)".</summary>
    HalfWidth,

    /// <summary>A plain phrase.</summary>
    Note,
}

/// <summary>One reason behind a carbon window, kept as data and written only when read.</summary>
internal readonly record struct ReasonTerm(ReasonKind Kind, string Label, int Count, double Ppm)
{
    /// <summary>The phrase a chemist reads.</summary>
    public string Format() => Kind switch
    {
        ReasonKind.Base => string.Create(CultureInfo.InvariantCulture, $"{Label} {Signed(Ppm, false)}"),
        ReasonKind.Increment when Count > 1 =>
            string.Create(CultureInfo.InvariantCulture, $"{Label} ×{Count} {Signed(Ppm, true)}"),
        ReasonKind.Increment => string.Create(CultureInfo.InvariantCulture, $"{Label} {Signed(Ppm, true)}"),
        ReasonKind.HalfWidth when Count > 0 =>
            string.Create(CultureInfo.InvariantCulture, $"±{Ppm:0.0}: {Count} {(Count == 1 ? Singular(Label) : Label)}"),
        ReasonKind.HalfWidth => string.Create(CultureInfo.InvariantCulture, $"±{Ppm:0.0}: {Label}"),
        _ => Label,
    };

    // "substituents (increment error)" → "substituent (increment error)" for a count of one.
    private static string Singular(string label)
    {
        var space = label.IndexOf(' ', StringComparison.Ordinal);
        var word = space < 0 ? label : label[..space];
        return word.EndsWith('s') ? word[..^1] + label[word.Length..] : label;
    }

    // The minus sign is U+2212 as in printed tables; a plus sign only where the value is a change.
    private static string Signed(double ppm, bool plus) =>
        ppm < 0 ? "−" + (-ppm).ToString("0.0", CultureInfo.InvariantCulture)
        : (plus ? "+" : "") + ppm.ToString("0.0", CultureInfo.InvariantCulture);
}
