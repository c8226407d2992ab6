using System.Collections.Concurrent;

namespace ConsistencyHost.Spectra.Model;

/// <summary>
/// Remembers the reading of each multiplicity text seen: the vocabulary is small ("d", "dd", "br s", "m" …)
/// while the text is read for every signal and again by every rule that asks for a signal's pattern.
/// </summary>
/// <remarks>
/// Reading is a pure function of the text, so a remembered answer is the answer. Bounded: once
/// <see cref="Capacity"/> texts are held, new ones are read without being kept (free text in a malformed
/// report must not grow the process).
/// </remarks>
internal static class ParsedMultiplicities
{
    /// <summary>Most texts kept; journals use a few dozen spellings.</summary>
    public const int Capacity = 1024;

    /// <summary>Longest text kept; longer ones are notes or errors rather than multiplicities.</summary>
    private const int LongestKept = 24;

    private static readonly ConcurrentDictionary<string, Multiplicity> Seen = new(StringComparer.Ordinal);
    private static int count;

    public static Multiplicity Get(string text)
    {
        if (Seen.TryGetValue(text, out var known)) return known;
        var parsed = MultiplicityText.Parse(text);
        if (text.Length <= LongestKept && Volatile.Read(ref count) < Capacity && Seen.TryAdd(text, parsed))
            Interlocked.Increment(ref count);
        return parsed;
    }
}
