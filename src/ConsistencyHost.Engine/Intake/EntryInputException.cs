namespace ConsistencyHost.Engine.Intake;

/// <summary>
/// The entry cannot be checked at all. <see cref="Field"/> is the path of the offending request field
/// ("structure.smiles", "spectra[1].reported_text"); <see cref="Reason"/> says what was wrong and what was
/// expected. The transports turn it into INVALID_ARGUMENT (gRPC) or exit code 2 (CLI).
/// </summary>
public sealed class EntryInputException(string field, string reason) : Exception($"{field}: {reason}")
{
    /// <summary>Path of the offending field.</summary>
    public string Field { get; } = field;

    /// <summary>What was wrong and what was expected.</summary>
    public string Reason { get; } = reason;
}
