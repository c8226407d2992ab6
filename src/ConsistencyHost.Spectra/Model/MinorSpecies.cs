namespace ConsistencyHost.Spectra.Model;

/// <summary>Signals the author marked as belonging to another species ("minor rotamer", "minor isomer").</summary>
public static class MinorSpecies
{
    /// <summary>
    /// True when a note says "minor": such a signal is reported for completeness and is not one of the compound's
    /// environments (common practice for rotamer and diastereomer mixtures).
    /// </summary>
    public static bool IsMinorSpecies(this Signal signal)
    {
        ArgumentNullException.ThrowIfNull(signal);
        return signal.Notes.Any(n => n.Contains("minor", StringComparison.OrdinalIgnoreCase));
    }
}
