namespace ConsistencyHost.Spectra.Jcamp;

/// <summary>
/// Reads NMR peak tables from JCAMP-DX text: labelled data records, $$ comments, label normalisation,
/// (XY..XY), (XYW..XYW), (XYM..XYM) and PEAK ASSIGNMENTS, XFACTOR/YFACTOR, Hz → ppm via .OBSERVE FREQUENCY,
/// NPOINTS check, LINK blocks and several blocks per file.
/// </summary>
/// <remarks>
/// McDonald &amp; Wilks 1988 (JCAMP-DX 4.24); Davies &amp; Lampen 1993 (NMR); label details from memory and
/// corroborated in public readers (docs/spectra.md lists what is and is not read). Y values are intensities;
/// they are put in <see cref="Model.Signal.Integral"/> because a peak table carries no other size.
/// </remarks>
public static class JcampReader
{
    /// <summary>Longest text read, in characters.</summary>
    public const int MaxTextLength = 10_000_000;

    /// <summary>Reads every block of <paramref name="text"/>.</summary>
    public static JcampResult Read(string text)
    {
        ArgumentNullException.ThrowIfNull(text);
        var sink = new JcampProblemSink();
        if (text.Length > MaxTextLength)
        {
            sink.AddMessage(1, 1, "", JcampMessages.ExpectedShorterText, JcampMessages.TextTooLong(text.Length, MaxTextLength));
            return new JcampResult { Problems = sink.Problems };
        }
        var records = JcampLexer.Read(text, sink);
        var blocks = JcampBlockReader.Read(records, sink);
        return new JcampResult
        {
            Blocks = blocks,
            Problems = [.. sink.Problems.OrderBy(p => p.Line).ThenBy(p => p.Column)],
        };
    }
}
