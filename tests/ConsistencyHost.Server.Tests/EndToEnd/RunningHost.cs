using ConsistencyHost.Server.Hosting;
using ConsistencyHost.Server.Tests.Access;
using ConsistencyHost.Tests.Shared;
using Grpc.Net.Client;
using Microsoft.AspNetCore.Builder;
using Microsoft.Extensions.DependencyInjection;
using Microsoft.Extensions.Logging;

namespace ConsistencyHost.Server.Tests.EndToEnd;

/// <summary>
/// The real host started on a free loopback port with a plugin folder of the test's choosing, and a
/// channel to it. Stopped and cleaned up on dispose.
/// </summary>
internal sealed class RunningHost : IAsyncDisposable
{
    private readonly WebApplication _app;
    private readonly PluginFolder _plugins;

    private RunningHost(WebApplication app, PluginFolder plugins, Uri address, Uri httpAddress, CapturedLog log)
    {
        _app = app;
        Log = log;
        _plugins = plugins;
        Address = address;
        HttpAddress = httpAddress;
        Channel = GrpcChannel.ForAddress(address);
    }

    public Uri Address { get; }

    /// <summary>The JSON over HTTP/1.1 endpoint.</summary>
    public Uri HttpAddress { get; }

    public GrpcChannel Channel { get; }

    /// <summary>Every line the host logged (at the configured levels: Information and up by default).</summary>
    public CapturedLog Log { get; }

    public int Port => Address.Port;

    /// <summary>The host's temporary plugin folder; workers carry it in their command line.</summary>
    public string PluginsPath => _plugins.Path;

    /// <summary>A service of the running host (e.g. its stream in-flight counts).</summary>
    public T Service<T>() where T : notnull => _app.Services.GetRequiredService<T>();

    /// <param name="plugins">Built plugins to copy into the host's plugin folder.</param>
    /// <param name="configFile">A JSON configuration file, or null.</param>
    /// <param name="folderCreated">Called with the plugin folder's path before the host is built (to add a broken plugin, or to learn where it is when the build throws).</param>
    public static async Task<RunningHost> StartAsync(string[] plugins, string? configFile = null, Action<string>? folderCreated = null)
    {
        var folder = PluginFolder.With(plugins);
        folderCreated?.Invoke(folder.Path);
        WebApplication app;
        try
        {
            app = ServerApp.Build(new ServerLaunch { PluginsPath = folder.Path, Port = 0, HttpPort = 0, ConfigFile = configFile });
        }
        catch
        {
            folder.Dispose();
            throw;
        }

        var log = new CapturedLog();
        app.Services.GetRequiredService<ILoggerFactory>().AddProvider(log);
        await app.StartAsync().WaitAsync(TimeSpan.FromSeconds(60));
        var endpoints = ServerApp.Endpoints(app);
        return new RunningHost(app, folder, endpoints.Grpc, endpoints.Http, log);
    }

    public async ValueTask DisposeAsync()
    {
        Channel.Dispose();
        await _app.StopAsync().WaitAsync(TimeSpan.FromSeconds(60));
        await _app.DisposeAsync();
        _plugins.Dispose();
    }
}
