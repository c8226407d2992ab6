using ConsistencyHost.Sdk.Findings;
using WireFinding = ConsistencyHost.Contract.V1.Finding;
using WireSeverity = ConsistencyHost.Contract.V1.Severity;

namespace ConsistencyHost.Contract.Mapping;

/// <summary>
/// Reads a finding back from the wire, as the host does with what a worker returns. A finding the worker
/// sends with an unknown severity or no code is its rule's bug, reported as such rather than dropped.
/// </summary>
public static class FindingMapper
{
    /// <summary>Maps one wire finding onto the SDK's finding; throws <see cref="FormatException"/> when it is malformed.</summary>
    public static Finding FromWire(WireFinding wire) => new Finding(
        wire.Code is { Length: > 0 } code ? code : throw new FormatException("a finding from the worker has no code"),
        FromWire(wire.Severity),
        wire.Message is { Length: > 0 } message ? message : throw new FormatException($"finding '{wire.Code}' from the worker has no message"))
    {
        Atoms = [.. wire.Atoms],
        Peaks = [.. wire.Peaks.Select(p => new PeakRef(p.Spectrum, p.Signal))],
        Evidence = [.. wire.Evidence.Select(e => new KeyValuePair<string, string>(e.Name, e.Value))],
    };

    private static Severity FromWire(WireSeverity severity) => severity switch
    {
        WireSeverity.Info => Severity.Info,
        WireSeverity.Warning => Severity.Warning,
        WireSeverity.Error => Severity.Error,
        _ => throw new FormatException($"a finding from the worker has severity {severity}; expected info, warning or error"),
    };
}
