namespace ConsistencyHost.Server.Tests.Isolation;

/// <summary>
/// Finds live rule workers by what their command line contains (the test's own temporary plugin folder), so
/// a test can check that the workers it caused are gone once its host is disposed.
/// </summary>
internal static class WorkerProcesses
{
    public static IReadOnlyList<int> Running(string commandLineFragment)
    {
        var found = new List<int>();
        foreach (var folder in Directory.EnumerateDirectories("/proc"))
        {
            if (!int.TryParse(Path.GetFileName(folder), out var pid)) continue;
            string commandLine;
            try
            {
                commandLine = File.ReadAllText(Path.Combine(folder, "cmdline")).Replace('\0', ' ');
            }
            catch (IOException)
            {
                continue;
            }
            catch (UnauthorizedAccessException)
            {
                continue;
            }

            if (commandLine.Contains("ConsistencyHost.Worker.dll", StringComparison.Ordinal)
                && commandLine.Contains(commandLineFragment, StringComparison.Ordinal))
            {
                found.Add(pid);
            }
        }

        return found;
    }
}
