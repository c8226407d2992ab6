using System.Globalization;

namespace ConsistencyHost.Isolation;

/// <summary>
/// The host process's own user id and effective capabilities, read from <c>/proc/self/status</c> (proc(5): the
/// <c>Uid:</c> line's second field is the effective uid, <c>CapEff:</c> a hexadecimal mask, bit numbers from
/// linux/capability.h). Used to tell, before any worker starts, whether each worker can get a uid of its own.
/// </summary>
internal static class HostCredentials
{
    /// <summary>
    /// What the host needs to start workers under other uids and keep them in hand: chown their private folder to
    /// them (CAP_CHOWN), reach the socket inside it and remove it (CAP_DAC_OVERRIDE), kill them on overrun
    /// (CAP_KILL), and switch to their uid and group (CAP_SETUID, CAP_SETGID) through setpriv.
    /// </summary>
    public static readonly IReadOnlyList<(int Bit, string Name)> Needed =
    [
        (0, "CAP_CHOWN"), (1, "CAP_DAC_OVERRIDE"), (5, "CAP_KILL"), (6, "CAP_SETGID"), (7, "CAP_SETUID"),
    ];

    /// <summary>The effective uid, or -1 when /proc cannot be read (not Linux).</summary>
    public static long EffectiveUid => Field("Uid:") is { } line && line.Split('\t', StringSplitOptions.RemoveEmptyEntries) is { Length: > 1 } ids
        && long.TryParse(ids[1], NumberStyles.None, CultureInfo.InvariantCulture, out var uid) ? uid : -1;

    /// <summary>The names of the <see cref="Needed"/> capabilities the host lacks in its effective set.</summary>
    public static IReadOnlyList<string> MissingCapabilities()
    {
        var mask = Field("CapEff:") is { } line && ulong.TryParse(line.Trim(), NumberStyles.HexNumber, CultureInfo.InvariantCulture, out var bits) ? bits : 0UL;
        return [.. Needed.Where(c => (mask & (1UL << c.Bit)) == 0).Select(c => c.Name)];
    }

    private static string? Field(string name)
    {
        try
        {
            return File.ReadLines("/proc/self/status").FirstOrDefault(l => l.StartsWith(name, StringComparison.Ordinal))?[name.Length..];
        }
        catch (IOException)
        {
            return null;
        }
        catch (UnauthorizedAccessException)
        {
            return null;
        }
    }
}
