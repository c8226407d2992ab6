using System.Collections;
using System.Globalization;
using System.Text;

namespace ConsistencyHost.Cli.Batch.Html;

/// <summary>
/// Element ids for the entry sections, so a notebook can link to one entry of the page (report.html#entry-AIS-LQ-0436):
/// "entry-" and the entry id with every character outside [A-Za-z0-9._-] replaced by "_". Unique on the page: an id
/// that may have been given already (two entries with one id, or two ids that read the same once replaced) gets
/// "~" and the entry's position in the batch, which no plain id contains.
/// </summary>
/// <remarks>
/// "May have been given" is read from a fixed bitmap of hashes (1 MiB, however large the batch), so that the
/// page writer keeps nothing per entry in memory (docs/batch.md, Streaming). A false positive only adds a suffix
/// to an id that did not need it; ids stay unique either way, because positions are.
/// </remarks>
internal sealed class SectionAnchors
{
    private const int Bits = 1 << 23;
    private readonly BitArray _seen = new(Bits);
    private int _position;

    public string Next(string entryId)
    {
        _position++;
        var plain = "entry-" + Clean(entryId);
        var bit = (int)((uint)StringComparer.Ordinal.GetHashCode(plain) % Bits);
        if (!_seen[bit])
        {
            _seen[bit] = true;
            return plain;
        }

        return plain + "~" + _position.ToString(CultureInfo.InvariantCulture);
    }

    private static string Clean(string entryId)
    {
        var text = new StringBuilder(entryId.Length);
        foreach (var c in entryId)
        {
            text.Append(char.IsAsciiLetterOrDigit(c) || c is '.' or '_' or '-' ? c : '_');
        }

        return text.ToString();
    }
}
