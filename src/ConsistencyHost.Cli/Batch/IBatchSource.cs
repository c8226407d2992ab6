namespace ConsistencyHost.Cli.Batch;

/// <summary>Where a batch's entries come from: read lazily, one at a time, so that memory stays flat.</summary>
internal interface IBatchSource
{
    /// <summary>How many entries the source holds (a cheap pass), for the progress estimate.</summary>
    int Count();

    /// <summary>The entries in source order.</summary>
    IEnumerable<BatchItem> Read();
}
