using System.Diagnostics;

namespace ConsistencyHost.Isolation;

/// <summary>
/// Whether this machine lets the host put a worker in a fresh network namespace (no interfaces but a
/// downed loopback): as root plain <c>unshare --net</c>; otherwise through an unprivileged user namespace.
/// Probed once; null when neither works (a container without the capability), and the gap is logged.
/// </summary>
internal static class NetworkNamespace
{
    private static readonly Lazy<string[]?> Probed = new(Probe);

    public static string[]? Arguments => Probed.Value;

    private static string[]? Probe()
    {
        if (!File.Exists("/usr/bin/unshare") || !File.Exists("/bin/true")) return null;
        string[][] attempts = [["--net"], ["--user", "--map-current-user", "--net"]];
        return attempts.FirstOrDefault(Works);
    }

    private static bool Works(string[] arguments)
    {
        try
        {
            var start = new ProcessStartInfo("/usr/bin/unshare") { UseShellExecute = false, RedirectStandardError = true };
            foreach (var argument in arguments) start.ArgumentList.Add(argument);
            start.ArgumentList.Add("/bin/true");
            using var process = Process.Start(start)!;
            if (!process.WaitForExit(TimeSpan.FromSeconds(10)))
            {
                process.Kill();
                return false;
            }

            return process.ExitCode == 0;
        }
        catch (System.ComponentModel.Win32Exception)
        {
            return false;
        }
    }
}
