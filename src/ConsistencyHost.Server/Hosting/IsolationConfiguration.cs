using ConsistencyHost.Engine.Profiles;
using ConsistencyHost.Isolation;
using Microsoft.Extensions.Configuration;

namespace ConsistencyHost.Server.Hosting;

/// <summary>
/// Reads the "ConsistencyHost:Isolation" section and builds the worker executor for untrusted plugins.
/// </summary>
/// <example>
/// <code>"Isolation": { "Enabled": true, "CrashLimit": 3, "CrashWindowMinutes": 5, "ManagedHeapMegabytes": 256, "IsolateNetwork": true,
/// "CompileTimeoutSeconds": 60, "CompileHeapMegabytes": 768, "WorkerUidRange": "700000000-700009999", "ReadOnlyFileSystem": true }</code>
/// </example>
public static class IsolationConfiguration
{
    private static readonly string[] Keys = ["Enabled", "CrashLimit", "CrashWindowMinutes", "ManagedHeapMegabytes", "IsolateNetwork", "WorkerPath", "CompileTimeoutSeconds", "CompileHeapMegabytes", "WorkerUidRange", "ReadOnlyFileSystem"];

    /// <summary>
    /// The executor, or null when "Enabled" is false (every rule then runs in-process, as in the engine's
    /// embedded use); throws <see cref="ProfileConfigurationException"/> listing every bad key or value.
    /// </summary>
    public static WorkerRuleExecutor? CreateExecutor(IConfigurationSection section)
    {
        var problems = new List<string>();
        foreach (var child in section.GetChildren().Where(c => !Keys.Contains(c.Key, StringComparer.OrdinalIgnoreCase)))
        {
            problems.Add($"{child.Path}: unknown key {ConfiguredValue.Quote(child.Key)}; expected one of {string.Join(", ", Keys)}");
        }

        var defaults = new IsolationOptions();
        var enabled = Read(section, "Enabled", true, _ => true, problems);
        var options = defaults with
        {
            CrashLimit = Read(section, "CrashLimit", defaults.CrashLimit, v => v is >= 1 and <= 1000, problems),
            CrashWindow = TimeSpan.FromMinutes(Read(section, "CrashWindowMinutes", defaults.CrashWindow.TotalMinutes, v => v is > 0 and <= 1440, problems)),
            ManagedHeapBytes = Read(section, "ManagedHeapMegabytes", defaults.ManagedHeapBytes / (1024 * 1024), v => v is >= 32 and <= 65536, problems) * 1024 * 1024,
            CompileTimeout = TimeSpan.FromSeconds(Read(section, "CompileTimeoutSeconds", defaults.CompileTimeout.TotalSeconds, v => v is >= 1 and <= 3600, problems)),
            CompileHeapBytes = Read(section, "CompileHeapMegabytes", defaults.CompileHeapBytes / (1024 * 1024), v => v is >= 128 and <= 65536, problems) * 1024 * 1024,
            IsolateNetwork = Read(section, "IsolateNetwork", defaults.IsolateNetwork, _ => true, problems),
            ReadOnlyFileSystem = Read(section, "ReadOnlyFileSystem", defaults.ReadOnlyFileSystem, _ => true, problems),
            WorkerUids = ReadUidRange(section, defaults.WorkerUids, problems),
            WorkerAssemblyPath = section["WorkerPath"] is { Length: > 0 } path ? Path.GetFullPath(path) : defaults.WorkerAssemblyPath,
        };
        if (problems.Count > 0) throw new ProfileConfigurationException(problems, ProfileConfigurationException.HostTitle);
        if (!enabled) return null;
        try
        {
            return new WorkerRuleExecutor(options);
        }
        catch (FileNotFoundException error)
        {
            throw new ProfileConfigurationException([$"{section.Path}: {error.Message}"], ProfileConfigurationException.HostTitle);
        }
    }

    private static UidRange ReadUidRange(IConfigurationSection section, UidRange fallback, List<string> problems)
    {
        if (section["WorkerUidRange"] is not { } text) return fallback;
        if (UidRange.Parse(text, out var problem) is { } range) return range;
        problems.Add($"{section.Path}:WorkerUidRange: {ConfiguredValue.Quote(text)} is not a uid range; {problem}");
        return fallback;
    }

    private static T Read<T>(IConfigurationSection section, string key, T fallback, Func<T, bool> valid, List<string> problems)
    {
        if (section[key] is not { } text) return fallback;
        try
        {
            var value = section.GetValue(key, fallback)!;
            if (valid(value)) return value;
        }
        catch (InvalidOperationException)
        {
            // Reported below with the key's path.
        }

        problems.Add($"{section.Path}:{key}: {ConfiguredValue.Quote(text)} is not a valid {typeof(T).Name} here");
        return fallback;
    }
}
