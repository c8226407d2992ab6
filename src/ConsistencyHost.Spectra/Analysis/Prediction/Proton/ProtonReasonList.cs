using System.Text;

namespace ConsistencyHost.Spectra.Analysis.Prediction.Proton;

/// <summary>
/// The reasons of one 1H window: its terms in the order applied, then one phrase for the half-width and what it is
/// made of ("±0.45: additivity error 0.30, 2 α groups +0.10, …"); written on first read.
/// </summary>
internal sealed class ProtonReasonList(ProtonReason[] terms, int termCount, WidthPart[]? widths, int widthCount, double halfWidth)
    : LazyReasons
{
    public override int Count => termCount + (widthCount > 0 ? 1 : 0);

    protected override string[] Write()
    {
        var phrases = new string[Count];
        for (var i = 0; i < termCount; i++)
        {
            phrases[i] = terms[i].Format();
        }

        if (widthCount > 0)
        {
            phrases[termCount] = WidthPhrase();
        }

        return phrases;
    }

    private string WidthPhrase()
    {
        var text = new StringBuilder("±").Append(Ppm.Plain(halfWidth)).Append(':');
        for (var i = 0; i < widthCount; i++)
        {
            text.Append(i == 0 ? " " : ", ").Append(widths![i].Written).Append(' ')
                .Append(i == 0 ? Ppm.Plain(widths[i].Ppm) : Ppm.Signed(widths[i].Ppm));
        }

        return text.ToString();
    }
}
