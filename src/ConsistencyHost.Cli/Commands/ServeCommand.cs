using System.Globalization;
using ConsistencyHost.Cli.CommandLine;
using ConsistencyHost.Engine.Profiles;
using ConsistencyHost.Server.Hosting;
using Microsoft.Extensions.Hosting;

namespace ConsistencyHost.Cli.Commands;

/// <summary>
/// <c>serve</c>: starts the gRPC host. Prints one line "listening on ADDRESS" to stdout once it accepts calls
/// (scripts and tests read the port from it when started with --port 0), and stops on Ctrl+C or SIGTERM.
/// </summary>
internal static class ServeCommand
{
    private static readonly Dictionary<string, string> Valued = new(EngineFactory.EngineOptions, StringComparer.Ordinal)
    {
        ["--port"] = "--port",
    };

    public const string Usage = "serve [--port N] [--plugins DIR] [--config FILE]";

    public static async Task<int> RunAsync(IReadOnlyList<string> raw, TextWriter stdout)
    {
        var args = ParsedArguments.Parse(raw, Valued, []);
        int? port = null;
        if (args.Value("--port") is { } text)
        {
            port = int.TryParse(text, NumberStyles.Integer, CultureInfo.InvariantCulture, out var p) && p is >= 0 and <= 65535
                ? p
                : throw new UsageException($"--port must be a number from 0 to 65535, not '{text}'");
        }

        if (args.Value("--plugins") is { } plugins && !Directory.Exists(plugins))
        {
            throw new UsageException($"plugin folder '{plugins}' does not exist");
        }

        Microsoft.AspNetCore.Builder.WebApplication app;
        try
        {
            app = ServerApp.Build(new ServerLaunch { ConfigFile = args.Value("--config"), PluginsPath = args.Value("--plugins"), Port = port });
        }
        catch (ProfileConfigurationException error)
        {
            throw new UsageException(error.Message);
        }

        await app.StartAsync();
        foreach (var address in ServerApp.ListeningAddresses(app))
        {
            await stdout.WriteLineAsync($"listening on {address}");
        }

        await stdout.FlushAsync();
        await app.WaitForShutdownAsync();
        return ExitCodes.Ok;
    }
}
