namespace ConsistencyHost.Cli.CommandLine;

/// <summary>The command line cannot be used as given; the message says why. Exit code 2.</summary>
public sealed class UsageException(string message) : Exception(message);
