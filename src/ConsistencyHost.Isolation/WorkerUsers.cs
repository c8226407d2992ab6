using System.Diagnostics;
using System.Globalization;

namespace ConsistencyHost.Isolation;

/// <summary>
/// Gives each worker a uid of its own from <see cref="IsolationOptions.WorkerUids"/>, so that no worker can signal,
/// trace or read the files and sockets of another worker or of the host. Ids are never reused while the host runs:
/// a process a killed worker left behind keeps its uid, and a fresh worker must not share it. Where this host cannot
/// switch uids, <see cref="UnavailableReason"/> says what is missing and no uid is handed out — an untrusted plugin
/// never runs with the host's own uid.
/// </summary>
internal sealed class WorkerUsers
{
    private readonly UidRange _range;
    private readonly Lazy<string?> _unavailable;
    private int _given;

    public WorkerUsers(UidRange range)
    {
        _range = range;
        _unavailable = new Lazy<string?>(() => Probe(range));
    }

    /// <summary>Why workers cannot get their own uid here (what is missing), or null when they can.</summary>
    public string? UnavailableReason => _unavailable.Value;

    /// <summary>A uid no worker of this host has had; throws <see cref="WorkerStartException"/> when none can be given.</summary>
    public int Next()
    {
        if (UnavailableReason is { } reason) throw new WorkerStartException(reason);
        var index = Interlocked.Increment(ref _given) - 1;
        if (index < 0 || index >= _range.Count)
        {
            throw new WorkerStartException($"every uid of Isolation:WorkerUidRange {_range} ({_range.Count} ids) has been given to a worker since the host "
                + "started; ids are not reused while the host runs (a process left behind by a killed worker keeps its uid), so restart the host or widen the range");
        }

        return _range.First + index;
    }

    private static string? Probe(UidRange range)
    {
        const string need = "worker isolation needs the host to run as root, or with CAP_CHOWN, CAP_DAC_OVERRIDE, CAP_KILL, CAP_SETGID and CAP_SETUID, "
            + "to start each worker under a uid of its own (Isolation:WorkerUidRange {0})";
        var prefix = string.Format(CultureInfo.InvariantCulture, need, range);
        if (!OperatingSystem.IsLinux()) return $"{prefix}; workers run on Linux only";
        if (!File.Exists(WorkerCommand.Setpriv)) return $"{prefix}; {WorkerCommand.Setpriv} (util-linux) is missing";
        var uid = HostCredentials.EffectiveUid;
        if (range.Contains(uid)) return $"{prefix}; the range holds the host's own uid {uid}";
        if (HostCredentials.MissingCapabilities() is { Count: > 0 } missing)
        {
            return $"{prefix}; this host runs as uid {uid} without {string.Join(", ", missing)}"
                + " (a user namespace that maps only the host's uid would leave every worker with the host's uid)";
        }

        // The capabilities can be there while the uid is not: a container in a user namespace maps only some ids.
        return SwitchFails(range.First) is { } failure ? $"{prefix}; setpriv could not switch to uid {range.First}: {failure}" : null;
    }

    private static string? SwitchFails(int uid)
    {
        try
        {
            var start = new ProcessStartInfo(WorkerCommand.Setpriv) { UseShellExecute = false, RedirectStandardError = true };
            foreach (var argument in WorkerCommand.SwitchUser(uid)) start.ArgumentList.Add(argument);
            start.ArgumentList.Add("/bin/true");
            using var process = Process.Start(start)!;
            var error = process.StandardError.ReadToEndAsync();
            if (!process.WaitForExit(TimeSpan.FromSeconds(10)))
            {
                process.Kill();
                return "it did not finish within 10 s";
            }

            return process.ExitCode == 0 ? null : $"exit code {process.ExitCode}: {error.GetAwaiter().GetResult().Trim()}";
        }
        catch (System.ComponentModel.Win32Exception error)
        {
            return error.Message;
        }
    }
}
