using ConsistencyHost.Engine.Profiles;

namespace ConsistencyHost.Engine.Plugins.Safety;

/// <summary>
/// Refuses a plugin folder that someone other than the host's user could change: a plugin is code the host
/// runs, so whoever may write a plugin file may run code as the host. The plugin folder, every plugin in it
/// (a bare assembly, or a sub-folder with everything under it) must be owned by the host's user or root and
/// be neither group- nor world-writable; no folder above the plugin folder may be world-writable unless it is
/// sticky (like /tmp, where only an entry's owner may rename or delete it).
/// </summary>
/// <remarks>
/// For the plugin folder and what is in it, the rule is the one OpenSSH applies to a user's key files under
/// StrictModes (owner root or the user, no group or world write; from memory of OpenSSH's auth.c, safe_path).
/// Above the plugin folder only world-writable, non-sticky folders are refused, so that a plugin folder under
/// /tmp or in a group-shared tree still works. Symbolic links are followed: what counts is the file that gets
/// loaded. Linux only; elsewhere the check is skipped (docs/reliability.md says so).
/// </remarks>
public static class PluginFolderSafety
{
    /// <summary>Throws <see cref="ProfileConfigurationException"/> listing every unsafe path, or returns.</summary>
    /// <param name="pluginsPath">The plugin folder.</param>
    /// <param name="plugins">Each plugin's path: a bare assembly, or the sub-folder of a compiled or source plugin.</param>
    public static void Demand(string pluginsPath, IEnumerable<string> plugins)
    {
        var problems = Problems(pluginsPath, plugins);
        if (problems.Count > 0) throw new ProfileConfigurationException(problems, ProfileConfigurationException.AccessTitle);
    }

    /// <summary>Every unsafe path with its mode, owner and the fix; empty when the folder is safe or not on Linux.</summary>
    public static IReadOnlyList<string> Problems(string pluginsPath, IEnumerable<string> plugins)
    {
        if (!OperatingSystem.IsLinux()) return [];
        var hostUser = UnixFileStatus.EffectiveUserId;
        var root = Path.GetFullPath(pluginsPath);
        var problems = new List<string>();
        foreach (var ancestor in Ancestors(root)) CheckAncestor(ancestor, problems);
        CheckOwned(root, hostUser, problems);
        foreach (var path in plugins.SelectMany(Contents)) CheckOwned(path, hostUser, problems);
        return problems;
    }

    private static IEnumerable<string> Ancestors(string folder)
    {
        for (var parent = Path.GetDirectoryName(Path.TrimEndingDirectorySeparator(folder)); parent is not null; parent = Path.GetDirectoryName(parent))
        {
            yield return parent;
        }
    }

    private static IEnumerable<string> Contents(string plugin) => Directory.Exists(plugin)
        ? [plugin, .. Directory.EnumerateFileSystemEntries(plugin, "*", SearchOption.AllDirectories).Order(StringComparer.Ordinal)]
        : [plugin];

    private static void CheckAncestor(string path, List<string> problems)
    {
        if (UnixFileStatus.Read(path, out var error) is not { } status)
        {
            problems.Add(PluginFolderMessages.Unreadable(path, error!));
        }
        else if (status.WorldWritable && !status.Sticky)
        {
            problems.Add(PluginFolderMessages.OpenAncestor(path, status));
        }
    }

    private static void CheckOwned(string path, uint hostUser, List<string> problems)
    {
        if (UnixFileStatus.Read(path, out var error) is not { } status)
        {
            problems.Add(PluginFolderMessages.Unreadable(path, error!));
            return;
        }

        if (status.OwnerId != hostUser && status.OwnerId != 0) problems.Add(PluginFolderMessages.ForeignOwner(path, status, hostUser));
        if (status.GroupWritable || status.WorldWritable) problems.Add(PluginFolderMessages.Writable(path, status));
    }
}
