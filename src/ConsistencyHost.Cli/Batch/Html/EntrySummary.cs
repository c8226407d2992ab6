using ConsistencyHost.Contract.V1;

namespace ConsistencyHost.Cli.Batch.Html;

/// <summary>What the report keeps of an entry until the end: its rank and where its section lies.</summary>
internal sealed record EntrySummary(int Rank, int Errors, int Warnings, int Sequence, long Offset, int Length) : IComparable<EntrySummary>
{
    public const int ErrorRank = 3;
    public const int InputRank = 4;

    public static EntrySummary Of(CheckEntryResponse response, int sequence, long offset, int length) => new(
        response.InputError is not null ? InputRank : (int)response.HighestSeverity,
        response.Findings.Count(f => f.Severity == Severity.Error),
        response.Findings.Count(f => f.Severity == Severity.Warning),
        sequence,
        offset,
        length);

    /// <summary>Worst first: unreadable, then by highest severity, error count, warning count; then input order.</summary>
    public int CompareTo(EntrySummary? other)
    {
        if (other is null) return -1;
        var byRank = other.Rank.CompareTo(Rank);
        if (byRank != 0) return byRank;
        var byErrors = other.Errors.CompareTo(Errors);
        if (byErrors != 0) return byErrors;
        var byWarnings = other.Warnings.CompareTo(Warnings);
        return byWarnings != 0 ? byWarnings : Sequence.CompareTo(other.Sequence);
    }
}
