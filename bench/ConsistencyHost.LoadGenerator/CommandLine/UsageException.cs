namespace ConsistencyHost.LoadGenerator.CommandLine;

/// <summary>A command line the load generator cannot use; the message says which option and what was expected.</summary>
public sealed class UsageException(string message) : Exception(message);
