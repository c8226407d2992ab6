using ConsistencyHost.Cli.CommandLine;
using ConsistencyHost.Engine;
using ConsistencyHost.Engine.Profiles;
using ConsistencyHost.Server.Hosting;
using Microsoft.Extensions.Configuration;

namespace ConsistencyHost.Cli.Commands;

/// <summary>Builds the embedded engine for commands that run without a server.</summary>
internal static class EngineFactory
{
    /// <summary>Options shared by every engine-backed command.</summary>
    public static readonly Dictionary<string, string> EngineOptions = new(StringComparer.Ordinal)
    {
        ["--plugins"] = "--plugins",
        ["--config"] = "--config",
    };

    /// <summary>Builds the engine from --plugins and --config; bad configuration becomes a usage error.</summary>
    public static CheckEngine Create(ParsedArguments args)
    {
        var configuration = new ConfigurationBuilder();
        if (args.Value("--config") is { } file)
        {
            if (!File.Exists(file)) throw new UsageException($"configuration file '{file}' does not exist");
            configuration.AddJsonFile(Path.GetFullPath(file), optional: false);
        }

        try
        {
            var section = configuration.Build().GetSection("ConsistencyHost");
            var options = EngineConfiguration.Read(section, ServerApp.DefaultPluginsPath);
            if (args.Value("--plugins") is { } plugins)
            {
                if (!Directory.Exists(plugins)) throw new UsageException($"plugin folder '{plugins}' does not exist");
                options = options with { PluginsPath = Path.GetFullPath(plugins) };
            }

            var executor = IsolationConfiguration.CreateExecutor(section.GetSection("Isolation"));
            if (executor is not null)
            {
                // Workers also exit when the command's end of their standard input closes; this just does it first.
                AppDomain.CurrentDomain.ProcessExit += (_, _) => executor.Dispose();
            }

            try
            {
                return new CheckEngine(options, isolatedExecutor: executor);
            }
            catch
            {
                // The workers that described the plugins go with the engine that could not be built.
                executor?.Dispose();
                throw;
            }
        }
        catch (ProfileConfigurationException error)
        {
            throw new UsageException(error.Message);
        }
    }
}
