namespace ConsistencyHost.Isolation;

/// <summary>
/// Says how a worker ended from its exit code. On Unix .NET reports a process ended by a signal as 128 plus the
/// signal number (as shells do); a worker cannot exit with such a code itself, since exiting is banned to plugins.
/// </summary>
internal static class ExitStatus
{
    /// <summary>SIGKILL: the host's own kills (overrun, time limit) are reported where they are made, so any other is from outside.</summary>
    public const int KilledBySigkill = 128 + 9;

    /// <summary>True when the exit code says the process was ended by SIGKILL, which it cannot send itself through any allowed API.</summary>
    public static bool WasKilled(int exitCode) => exitCode == KilledBySigkill;

    /// <summary>"exited with code 3", "ended by signal 6 (SIGABRT)", or for SIGKILL who may have sent it.</summary>
    public static string Describe(int exitCode) => exitCode switch
    {
        KilledBySigkill => "was killed by signal 9 (SIGKILL) from outside the worker (another process, or the kernel's out-of-memory killer)",
        > 128 and < 128 + 65 => $"ended by signal {exitCode - 128}{Name(exitCode - 128)}",
        _ => $"exited with code {exitCode}",
    };

    private static string Name(int signal) => signal switch
    {
        6 => " (SIGABRT: the runtime aborted, e.g. out of memory or a stack overflow)",
        11 => " (SIGSEGV)",
        15 => " (SIGTERM)",
        _ => "",
    };
}
