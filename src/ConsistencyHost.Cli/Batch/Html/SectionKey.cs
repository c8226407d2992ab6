using ConsistencyHost.Contract.V1;

namespace ConsistencyHost.Cli.Batch.Html;

/// <summary>Where an entry's section goes on the page: its rank, then its error and warning counts.</summary>
internal readonly record struct SectionKey(int Rank, int Errors, int Warnings) : IComparable<SectionKey>
{
    public const int ErrorRank = 3;
    public const int InputRank = 4;

    public static SectionKey Of(CheckEntryResponse response) => new(
        response.InputError is not null ? InputRank : (int)response.HighestSeverity,
        response.Findings.Count(f => f.Severity == Severity.Error),
        response.Findings.Count(f => f.Severity == Severity.Warning));

    /// <summary>Worst first: unreadable, then by highest severity, error count, warning count.</summary>
    public int CompareTo(SectionKey other)
    {
        var byRank = other.Rank.CompareTo(Rank);
        if (byRank != 0) return byRank;
        var byErrors = other.Errors.CompareTo(Errors);
        return byErrors != 0 ? byErrors : other.Warnings.CompareTo(Warnings);
    }
}
