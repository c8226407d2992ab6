using System.Globalization;
using ConsistencyHost.Cli.CommandLine;
using ConsistencyHost.Engine.Profiles;
using ConsistencyHost.Server.Hosting;
using Microsoft.Extensions.Hosting;

namespace ConsistencyHost.Cli.Commands;

/// <summary>
/// <c>serve</c>: starts the gRPC host. Prints "listening on ADDRESS" (gRPC) and then "json over http on ADDRESS"
/// to stdout once it accepts calls (scripts and tests read the ports from them when started with port 0), and
/// stops on Ctrl+C or SIGTERM. --bind, --tls-cert, --tls-key and --client-ca set Server:BindAddress and
/// Server:Tls:*; API keys come only from configuration or the environment (Server__ApiKeys__NAME), never a flag.
/// </summary>
internal static class ServeCommand
{
    private static readonly Dictionary<string, string> Valued = new(EngineFactory.EngineOptions, StringComparer.Ordinal)
    {
        ["--port"] = "--port",
        ["--http-port"] = "--http-port",
        ["--bind"] = "--bind",
        ["--tls-cert"] = "--tls-cert",
        ["--tls-key"] = "--tls-key",
        ["--client-ca"] = "--client-ca",
    };

    public const string Usage = "serve [--port N] [--http-port N] [--bind ADDRESS] [--tls-cert PATH --tls-key PATH] [--client-ca PATH] [--echo]\n" +
        "      [--plugins DIR] [--config FILE]   (API keys: config Server:ApiKeys or env Server__ApiKeys__NAME)";

    public static async Task<int> RunAsync(IReadOnlyList<string> raw, TextWriter stdout)
    {
        // --echo serves consistencyhost.v1.Diagnostics/Echo for load tests (Server:EnableEcho); off by default.
        var args = ParsedArguments.Parse(raw, Valued, ["--echo"]);
        var port = ReadPort(args, "--port");
        var httpPort = ReadPort(args, "--http-port");

        if (args.Value("--plugins") is { } plugins && !Directory.Exists(plugins))
        {
            throw new UsageException($"plugin folder '{plugins}' does not exist");
        }

        Microsoft.AspNetCore.Builder.WebApplication app;
        try
        {
            app = ServerApp.Build(new ServerLaunch
            {
                ConfigFile = args.Value("--config"),
                PluginsPath = args.Value("--plugins"),
                Port = port,
                HttpPort = httpPort,
                BindAddress = args.Value("--bind"),
                TlsCertificatePath = args.Value("--tls-cert"),
                TlsKeyPath = args.Value("--tls-key"),
                ClientCertificateAuthorityPath = args.Value("--client-ca"),
                EnableEcho = args.Has("--echo") ? true : null,
            });
        }
        catch (ProfileConfigurationException error)
        {
            throw new UsageException(error.Message);
        }

        await app.StartAsync();
        // The first line's form is relied on by scripts; the JSON/HTTP address follows on its own line.
        var endpoints = ServerApp.Endpoints(app);
        await stdout.WriteLineAsync($"listening on {endpoints.Grpc.ToString().TrimEnd('/')}");
        await stdout.WriteLineAsync($"json over http on {endpoints.Http.ToString().TrimEnd('/')}");

        await stdout.FlushAsync();
        await app.WaitForShutdownAsync();
        return ExitCodes.Ok;
    }

    private static int? ReadPort(ParsedArguments args, string option) => args.Value(option) is not { } text
        ? null
        : int.TryParse(text, NumberStyles.Integer, CultureInfo.InvariantCulture, out var p) && p is >= 0 and <= 65535
            ? p
            : throw new UsageException($"{option} must be a number from 0 to 65535, not '{text}'");
}
