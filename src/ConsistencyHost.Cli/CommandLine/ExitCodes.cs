namespace ConsistencyHost.Cli.CommandLine;

/// <summary>The exit codes integrators script against. Stable.</summary>
public static class ExitCodes
{
    /// <summary>Done; for check: no finding has severity error.</summary>
    public const int Ok = 0;

    /// <summary>check: at least one finding has severity error.</summary>
    public const int ErrorFindings = 1;

    /// <summary>Unusable input or command line; the reason is on stderr and nothing is on stdout.</summary>
    public const int UnusableInput = 2;
}
