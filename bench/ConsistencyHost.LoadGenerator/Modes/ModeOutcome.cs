namespace ConsistencyHost.LoadGenerator.Modes;

/// <summary>What a mode produced: its JSON summary, and whether every call succeeded and the server lived.</summary>
/// <param name="Summary">Serialised as the mode's JSON summary.</param>
/// <param name="Ok">False on any failed or lost call or a server that died; the program then exits 1.</param>
public sealed record ModeOutcome(object Summary, bool Ok);
