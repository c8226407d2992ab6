using ConsistencyHost.Spectra.Model;

namespace ConsistencyHost.Spectra.Jcamp;

/// <summary>One ##TITLE= … ##END= block.</summary>
/// <param name="Title">The block's title.</param>
/// <param name="DataType">DATA TYPE as written ("NMR PEAK TABLE", "LINK").</param>
/// <param name="BlockId">BLOCK_ID when given.</param>
/// <param name="Labels">Every record by normalised label (last value wins), including those inherited from an enclosing LINK block.</param>
/// <param name="Spectrum">The peak table read from this block; null for LINK and non-peak blocks.</param>
public sealed record JcampBlock(string Title, string? DataType, string? BlockId, IReadOnlyDictionary<string, string> Labels, Spectrum? Spectrum);

/// <summary>What <see cref="JcampReader"/> read.</summary>
public sealed record JcampResult
{
    /// <summary>Every block in file order (a LINK block before its children).</summary>
    public IReadOnlyList<JcampBlock> Blocks { get; init; } = [];

    /// <summary>The spectra of all peak-table blocks, in file order.</summary>
    public IReadOnlyList<Spectrum> Spectra => [.. Blocks.Where(b => b.Spectrum is not null).Select(b => b.Spectrum!)];

    /// <summary>Every problem, in line order.</summary>
    public IReadOnlyList<JcampProblem> Problems { get; init; } = [];

    /// <summary>True when no problem is an error.</summary>
    public bool Succeeded => Problems.All(p => p.Severity != ProblemSeverity.Error);
}
