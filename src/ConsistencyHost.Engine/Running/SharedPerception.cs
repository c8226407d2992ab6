using ConsistencyHost.Sdk.Entries;

namespace ConsistencyHost.Engine.Running;

/// <summary>
/// Computes the perception every rule shares (formula, equivalence classes, the 1H interpretations) before any
/// rule's clock starts.
/// </summary>
/// <remarks>
/// The entry's perception is lazy and shared, so without this the first rule to touch it pays for everyone —
/// including, on a freshly started host, the one-off compilation of the whole perception stack — and can
/// overrun its deadline for work that is not its own. Intake limits (atoms, peaks, spectra) bound this step.
/// </remarks>
internal static class SharedPerception
{
    public static void Prepare(Entry entry)
    {
        try
        {
            if (entry.Perception is { } perception)
            {
                _ = perception.Formula;
                _ = perception.Equivalence;
            }

            var analysis = entry.Analysis;
            for (var i = 0; i < entry.Spectra.Count; i++)
            {
                _ = analysis.Protons(i);
            }
        }
        catch (Exception error) when (error is not OutOfMemoryException)
        {
            // The lazy values keep the exception: each rule that asks meets it again and is reported failed
            // with the reason, as before; the request itself goes on.
        }
    }
}
