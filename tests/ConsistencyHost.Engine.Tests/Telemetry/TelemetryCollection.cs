namespace ConsistencyHost.Engine.Tests.Telemetry;

/// <summary>
/// The engine's meter is process-wide: tests that count its measurements run alone, after the parallel ones,
/// so that no other test's checks are counted with theirs.
/// </summary>
[CollectionDefinition(Name, DisableParallelization = true)]
public sealed class TelemetryCollection
{
    public const string Name = "engine telemetry";
}
