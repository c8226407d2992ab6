using System.Globalization;

namespace ConsistencyHost.Sdk.Findings;

/// <summary>
/// One finding. <see cref="Code"/> is stable within the rule (declare codes as constants in an
/// <c>XxxCodes</c> class); <see cref="Message"/> is a sentence a chemist understands.
/// The host stamps rule id and version and applies the profile's severity overrides.
/// </summary>
public sealed record Finding
{
    /// <summary>Creates a finding with a code, a proposed severity and a message.</summary>
    public Finding(string code, Severity severity, string message)
    {
        ArgumentException.ThrowIfNullOrWhiteSpace(code);
        ArgumentException.ThrowIfNullOrWhiteSpace(message);
        Code = code;
        Severity = severity;
        Message = message;
    }

    /// <summary>Stable machine-readable code.</summary>
    public string Code { get; }

    /// <summary>Proposed severity, before the profile's overrides.</summary>
    public Severity Severity { get; init; }

    /// <summary>Human-readable message.</summary>
    public string Message { get; }

    /// <summary>0-based heavy-atom indices involved.</summary>
    public IReadOnlyList<int> Atoms { get; init; } = [];

    /// <summary>Signals involved.</summary>
    public IReadOnlyList<PeakRef> Peaks { get; init; } = [];

    /// <summary>Expected-versus-observed values, as (name, invariant text) pairs in a stable order.</summary>
    public IReadOnlyList<KeyValuePair<string, string>> Evidence { get; init; } = [];

    /// <summary>Returns a copy with one more evidence pair; numbers are written with the invariant culture.</summary>
    public Finding WithEvidence(string name, IFormattable value) =>
        WithEvidence(name, value.ToString(null, CultureInfo.InvariantCulture));

    /// <summary>Returns a copy with one more evidence pair.</summary>
    public Finding WithEvidence(string name, string value) =>
        this with { Evidence = [.. Evidence, new KeyValuePair<string, string>(name, value)] };
}
