using System.Text;
using ConsistencyHost.Contract.Worker;
using Microsoft.AspNetCore.Builder;
using Microsoft.AspNetCore.Hosting;
using Microsoft.AspNetCore.Server.Kestrel.Core;
using Microsoft.Extensions.DependencyInjection;
using Microsoft.Extensions.Diagnostics.HealthChecks;
using Microsoft.Extensions.Logging;

namespace ConsistencyHost.Worker;

/// <summary>Kestrel on the Unix socket the host chose, HTTP/2 only: the rule service and grpc.health.v1.</summary>
internal static class WorkerApp
{
    public static async Task<int> RunAsync(WorkerArguments arguments, string secret)
    {
        var plugin = LoadedPlugin.Load(arguments.PluginPath);
        var builder = WebApplication.CreateSlimBuilder(new WebApplicationOptions { ContentRootPath = AppContext.BaseDirectory });
        // Standard output carries the handshake line and nothing else; logs go to standard error.
        builder.Logging.ClearProviders();
        builder.Logging.AddConsole(console => console.LogToStandardErrorThreshold = LogLevel.Trace);
        builder.Logging.SetMinimumLevel(LogLevel.Warning);
        builder.WebHost.ConfigureKestrel(kestrel =>
            kestrel.ListenUnixSocket(arguments.SocketPath, listen => listen.Protocols = HttpProtocols.Http2));
        builder.Services.AddSingleton(plugin);
        builder.Services.AddSingleton(new LaunchSecret(Encoding.UTF8.GetBytes(secret)));
        builder.Services.AddGrpc(options => options.Interceptors.Add<SecretInterceptor>());
        // Serving once the plugin has loaded at least one rule; a worker whose plugin was refused inside it is
        // not healthy, and the host reports that instead of calling it.
        builder.Services.AddGrpcHealthChecks().AddCheck("plugin", () => plugin.Rules.Count > 0
            ? HealthCheckResult.Healthy()
            : HealthCheckResult.Unhealthy(plugin.Refusal));

        var app = builder.Build();
        app.MapGrpcService<RuleWorkerService>();
        app.MapGrpcHealthChecksService();
        await app.StartAsync();
        Console.Out.WriteLine(WorkerHandshake.Line(arguments.SocketPath));
        await Console.Out.FlushAsync();

        await HostGone();
        // The host closed our standard input (it stopped, or it died and the kernel closed the pipe): remove
        // the private folder a dead host cannot, and exit at once, even if a rule is still spinning.
        RemovePrivateFolder(arguments.SocketPath);
        Environment.Exit(0);
        return 0;
    }

    private static void RemovePrivateFolder(string socketPath)
    {
        try
        {
            Directory.Delete(Path.GetDirectoryName(socketPath)!, recursive: true);
        }
        catch (Exception error) when (error is IOException or UnauthorizedAccessException)
        {
            // The host removes it when it stops normally; the OS cleans the temporary folder otherwise.
        }
    }

    /// <summary>Completes when standard input reaches end of file: the host owns the other end.</summary>
    private static async Task HostGone()
    {
        while (await Console.In.ReadLineAsync() is not null)
        {
            // The host sends nothing after the secret; any line is ignored.
        }
    }
}
