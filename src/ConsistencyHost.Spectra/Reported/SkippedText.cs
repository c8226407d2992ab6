namespace ConsistencyHost.Spectra.Reported;

/// <summary>Non-NMR prose a lenient read skipped on purpose (an Rf, a melting point, an IR line, a yield …).</summary>
/// <param name="Offset">Character offset where the skipped clause starts.</param>
/// <param name="Kind">What the clause was recognised as ("Rf", "mp", "IR", "elemental analysis", "yield", "optical rotation").</param>
/// <param name="Fragment">The start of the clause, at most 30 characters.</param>
public sealed record SkippedText(int Offset, string Kind, string Fragment);
