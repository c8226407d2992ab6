namespace ConsistencyHost.Worker;

/// <summary>The worker's command line: <c>--plugin ASSEMBLY --socket PATH</c>.</summary>
internal sealed record WorkerArguments(string PluginPath, string SocketPath, string? Problem)
{
    public static WorkerArguments Parse(IReadOnlyList<string> args)
    {
        string? plugin = null, socket = null;
        for (var i = 0; i < args.Count; i++)
        {
            var value = i + 1 < args.Count ? args[i + 1] : null;
            switch (args[i])
            {
                case "--plugin": plugin = value; i++; break;
                case "--socket": socket = value; i++; break;
                default: return new("", "", $"unknown argument '{args[i]}'; expected --plugin ASSEMBLY --socket PATH");
            }
        }

        if (plugin is null || !File.Exists(plugin)) return new("", "", $"--plugin needs an existing assembly; got '{plugin}'");
        if (socket is null || !Path.IsPathFullyQualified(socket)) return new("", "", $"--socket needs an absolute path; got '{socket}'");
        return new(plugin, socket, null);
    }
}
