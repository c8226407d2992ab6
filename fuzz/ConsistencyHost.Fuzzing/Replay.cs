using System.Diagnostics;

namespace ConsistencyHost.Fuzzing;

/// <summary>Runs saved inputs through a harness in-process: to reproduce a crash, and to check a corpus.</summary>
internal static class Replay
{
    /// <summary>An input slower than this is reported as a hang (AFL's own limit is set in fuzz/run.sh).</summary>
    private static readonly TimeSpan HangLimit = TimeSpan.FromSeconds(10);

    public static int Run(Action<string> harness, string[] paths, TextWriter output)
    {
        var failures = 0;
        foreach (var file in paths.SelectMany(Files))
        {
            var text = InputText.Decode(File.ReadAllBytes(file));
            var task = Task.Run(() => harness(text));
            var clock = Stopwatch.StartNew();
            try
            {
                if (!task.Wait(HangLimit))
                {
                    output.WriteLine($"HANG  {file} (still running after {clock.Elapsed.TotalSeconds:F0} s)");
                    return 1;
                }
            }
            catch (AggregateException e)
            {
                failures++;
                output.WriteLine($"CRASH {file}\n{e.InnerException}");
            }
        }

        return failures == 0 ? 0 : 1;
    }

    private static IEnumerable<string> Files(string path) =>
        Directory.Exists(path) ? Directory.EnumerateFiles(path).Where(f => !Path.GetFileName(f).StartsWith('.')).Order(StringComparer.Ordinal) : [path];
}
