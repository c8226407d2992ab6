namespace ConsistencyHost.Spectra.Analysis.Prediction.Proton;

/// <summary>How a 1H reason term is written.</summary>
internal enum ProtonReasonKind : byte
{
    /// <summary>"base CH2 (Beauchamp–Marquez) 1.37": a starting or covered value.</summary>
    Value,

    /// <summary>"α-OC(=O)R +2.98": an increment.</summary>
    Change,

    /// <summary>A plain phrase.</summary>
    Note,
}

/// <summary>
/// One reason behind a 1H window, kept as data and written only when read: <see cref="Prefix"/> and
/// <see cref="Label"/> are joined then ("α-" + "OH"), so building the window does not concatenate.
/// </summary>
internal readonly record struct ProtonReason(ProtonReasonKind Kind, string? Prefix, string Label, double Ppm)
{
    /// <summary>The phrase a chemist reads.</summary>
    public string Format() => Kind switch
    {
        ProtonReasonKind.Value => string.Concat(Prefix, Label, " ", Proton.Ppm.Plain(Ppm)),
        ProtonReasonKind.Change => string.Concat(Prefix, Label, " ", Proton.Ppm.Signed(Ppm)),
        _ => string.Concat(Prefix, Label),
    };
}

/// <summary>One contribution to a 1H window's half-width; <see cref="Count"/> &gt; 0 is written before the label ("2 α groups").</summary>
internal readonly record struct WidthPart(double Ppm, string Why, int Count)
{
    /// <summary>The label as written.</summary>
    public string Written => Count > 0 ? string.Concat(Count.ToString(System.Globalization.CultureInfo.InvariantCulture), " ", Why) : Why;
}
