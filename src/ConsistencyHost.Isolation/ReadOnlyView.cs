using System.Diagnostics;

namespace ConsistencyHost.Isolation;

/// <summary>
/// A read-only view of the whole file system for a worker, except its private folder: in a fresh mount namespace
/// (<c>unshare --mount</c>, which makes propagation private) a small shell step, still as root, remounts every mount
/// read-only with its other flags kept, binds the private folder over itself writable, then execs the next wrapper
/// (<c>setpriv</c>). Needs CAP_SYS_ADMIN, so it is probed once, as root; where it fails (a container without
/// CAP_SYS_ADMIN, or a mount that cannot be remounted) workers see the file system as their uid's permissions allow,
/// and the host logs that gap.
/// </summary>
internal static class ReadOnlyView
{
    /// <summary>
    /// $1 is the private folder, the rest the command to exec. mountinfo(5): field 5 is the mount point (blanks as
    /// octal escapes, which printf %b undoes), field 6 its per-mount options ("rw,nosuid,nodev,relatime"), kept
    /// with rw turned into ro. One awk and one mount per mount point, nothing else forked: each process start costs
    /// tens of milliseconds on a loaded machine. Any mount that cannot be remounted stops the worker (set -e): no
    /// partial view.
    /// </summary>
    private const string Script = """
        set -eu
        dir=$1; shift
        awk '{ sub(/^rw/, "ro", $6); print $6, $5 }' /proc/self/mountinfo | while read -r options point; do
          case $point in *\\*) point=$(printf '%b' "$point") ;; esac
          mount -o "remount,bind,$options" "$point"
        done
        mount --bind "$dir" "$dir"
        mount -o remount,bind,rw,nosuid,nodev "$dir"
        exec "$@"
        """;

    private static readonly Lazy<bool> Probed = new(Probe);

    /// <summary>True when workers get the read-only view here.</summary>
    public static bool Available => Probed.Value;

    /// <summary>The <c>/bin/sh -c</c> step that sets up the view, for <paramref name="privateDirectory"/>; the command follows it.</summary>
    public static string[] Step(string privateDirectory) => ["/bin/sh", "-c", Script, "sh", privateDirectory];

    private static bool Probe()
    {
        if (!File.Exists(WorkerCommand.Unshare) || !File.Exists("/bin/sh") || !Environment.IsPrivilegedProcess) return false;
        var directory = Directory.CreateTempSubdirectory("ch-readonly-probe-").FullName;
        try
        {
            // As root inside the view: the private folder takes a file, the folder beside it does not.
            var start = new ProcessStartInfo(WorkerCommand.Unshare) { UseShellExecute = false, RedirectStandardError = true };
            foreach (var argument in (string[])["--mount", .. Step(directory), "/bin/sh", "-c", "! : > \"$0.ro-probe\" 2>/dev/null && : > \"$0/writable\"", directory])
            {
                start.ArgumentList.Add(argument);
            }

            using var process = Process.Start(start)!;
            _ = process.StandardError.ReadToEndAsync();
            if (!process.WaitForExit(TimeSpan.FromSeconds(20)))
            {
                process.Kill(entireProcessTree: true);
                return false;
            }

            return process.ExitCode == 0 && File.Exists(Path.Combine(directory, "writable"));
        }
        catch (System.ComponentModel.Win32Exception)
        {
            return false;
        }
        finally
        {
            Directory.Delete(directory, recursive: true);
            File.Delete(directory + ".ro-probe");
        }
    }
}
