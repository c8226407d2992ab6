using ConsistencyHost.Benchmarks.Entries;
using ConsistencyHost.Contract.V1;
using ConsistencyHost.Engine.Intake;
using ConsistencyHost.Sdk.Entries;
using Google.Protobuf;

namespace ConsistencyHost.LoadGenerator.Entries;

/// <summary>
/// The calls a load test sends: the realistic entry mix as CheckEntry requests, and for each an echo whose
/// payload is that request's serialised bytes, so both calls carry the same number of bytes in.
/// </summary>
public sealed class Workload
{
    private Workload(CheckEntryRequest[] checks)
    {
        Checks = checks;
        Echoes = [.. checks.Select(c => new EchoRequest { Payload = ByteString.CopyFrom(c.ToByteArray()) })];
    }

    /// <summary>CheckEntry requests, one per entry of the mix.</summary>
    public IReadOnlyList<CheckEntryRequest> Checks { get; }

    /// <summary>Echo requests, the i-th carrying the i-th check request's bytes.</summary>
    public IReadOnlyList<EchoRequest> Echoes { get; }

    /// <summary>Mean serialised size of a check request, bytes.</summary>
    public double MeanCheckRequestBytes => Checks.Average(c => c.CalculateSize());

    /// <summary>Mean serialised size of an echo request, bytes (the payload plus its 1-byte tag and length).</summary>
    public double MeanEchoRequestBytes => Echoes.Average(e => e.CalculateSize());

    /// <summary>The entry mix of bench/ConsistencyHost.Benchmarks.</summary>
    public static Workload FromEntryMix() => new([.. EntryMix.All.Select(ToRequest)]);

    /// <summary>The request for a submission that uses a SMILES, a formula and reported text (what the mix uses).</summary>
    /// <exception cref="InvalidOperationException">The submission uses a part this mapping does not carry.</exception>
    public static CheckEntryRequest ToRequest(EntrySubmission submission)
    {
        if (submission.Spectra.Count > 0 || submission.Hrms.Count > 0 || submission.NmredataRecord is not null
            || submission.Structure is { Format: not StructureFormat.Smiles })
        {
            throw new InvalidOperationException(
                $"entry {submission.EntryId}: the load generator maps SMILES, formula and reported text only; this entry has structured spectra, HRMS claims, an NMReDATA record or a molfile");
        }

        var request = new CheckEntryRequest { EntryId = submission.EntryId, Profile = submission.Profile ?? "" };
        if (submission.Structure is { } structure) request.Structure = new Structure { Smiles = structure.Text };
        if (submission.Formula is { } formula) request.Claims = new Claims { Formula = formula };
        request.ReportedText.AddRange(submission.ReportedText);
        return request;
    }
}
