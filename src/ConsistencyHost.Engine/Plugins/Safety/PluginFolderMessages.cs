namespace ConsistencyHost.Engine.Plugins.Safety;

/// <summary>Every message of the plugin-folder ownership and mode check, in one place; tests refer to them.</summary>
public static class PluginFolderMessages
{
    /// <summary>The start of every problem line, so that a log search finds them all.</summary>
    public const string Prefix = "unsafe plugin path ";

    internal static string Writable(string path, UnixFileStatus status) =>
        $"{Prefix}{Describe(path, status)}: writable by {Writers(status)}; a plugin runs with the host's rights, so only " +
        $"the host's user may change it (fix: chmod go-w '{path}')";

    internal static string ForeignOwner(string path, UnixFileStatus status, uint hostUser) =>
        $"{Prefix}{Describe(path, status)}: owned neither by the host's user (uid {hostUser}) nor by root " +
        $"(fix: chown {hostUser} '{path}')";

    internal static string OpenAncestor(string path, UnixFileStatus status) =>
        $"{Prefix}{Describe(path, status)}: a folder above the plugin folder is world-writable without the sticky bit, " +
        $"so anyone can put another plugin folder in its place (fix: chmod o-w '{path}', or chmod +t '{path}' as for /tmp)";

    internal static string Unreadable(string path, string reason) =>
        $"{Prefix}{path}: its owner and mode could not be read ({reason})";

    private static string Describe(string path, UnixFileStatus status) => $"{path} (mode {status.Octal}, owner uid {status.OwnerId})";

    private static string Writers(UnixFileStatus status) => (status.GroupWritable, status.WorldWritable) switch
    {
        (true, true) => "its group and by others",
        (true, false) => "its group",
        _ => "others",
    };
}
