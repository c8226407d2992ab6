using System.Diagnostics;
using System.Net.Sockets;
using System.Security.Cryptography;
using ConsistencyHost.Contract.Worker;
using ConsistencyHost.Contract.Worker.V1;
using Grpc.Core;
using Grpc.Core.Interceptors;
using Grpc.Health.V1;
using Grpc.Net.Client;

namespace ConsistencyHost.Isolation;

/// <summary>
/// One running worker: the child process under its own uid, its private 0700 folder (owned by that uid) with the
/// socket, and a channel that sends the launch secret on every call. Only the worker's uid and the host (root's
/// CAP_DAC_OVERRIDE) can enter the folder, so no other worker can reach the socket. Killing it kills the whole process tree and removes the folder.
/// </summary>
internal sealed class WorkerProcess : IAsyncDisposable
{
    private readonly Process _process;
    private readonly string _directory;
    private readonly GrpcChannel _channel;
    private readonly StderrTail _stderr;

    private WorkerProcess(Process process, string directory, GrpcChannel channel, CallInvoker invoker, StderrTail stderr)
    {
        (_process, _directory, _channel, _stderr) = (process, directory, channel, stderr);
        Client = new RuleWorker.RuleWorkerClient(invoker);
        Health = new Health.HealthClient(invoker);
    }

    public RuleWorker.RuleWorkerClient Client { get; }

    public Health.HealthClient Health { get; }

    public int Id => _process.Id;

    public bool HasExited => _process.HasExited;

    /// <summary>Starts a worker for one plugin and waits for its handshake; throws <see cref="WorkerStartException"/>.</summary>
    public static async Task<WorkerProcess> StartAsync(IsolationOptions options, int uid, string pluginAssembly, CancellationToken cancellationToken)
    {
        var directory = CreatePrivateDirectory(uid);
        var socket = Path.Combine(directory, "worker.sock");
        var process = Process.Start(WorkerCommand.Build(options, uid, pluginAssembly, directory, socket))
                      ?? throw new WorkerStartException("the worker process could not be started");
        var stderr = new StderrTail(process);
        var secret = Convert.ToHexString(RandomNumberGenerator.GetBytes(32));
        try
        {
            await process.StandardInput.WriteLineAsync(secret.AsMemory(), cancellationToken);
            await process.StandardInput.FlushAsync(cancellationToken);
            var line = await process.StandardOutput.ReadLineAsync(cancellationToken).AsTask().WaitAsync(options.StartTimeout, cancellationToken);
            var (path, problem) = WorkerHandshake.Parse(line);
            if (problem is not null) throw new WorkerStartException($"{problem}{stderr.Describe()}");
            if (path != socket) throw new WorkerStartException($"the worker listens on '{path}', not on the socket it was given");
            // After the handshake nothing on standard output is read; drain it so a plugin that writes there
            // cannot block on a full pipe (standard error is drained by StderrTail).
            _ = process.StandardOutput.BaseStream.CopyToAsync(Stream.Null, CancellationToken.None);
            var channel = Connect(socket);
            var invoker = channel.Intercept(metadata =>
            {
                metadata.Add(WorkerHandshake.SecretHeader, secret);
                return metadata;
            });
            var worker = new WorkerProcess(process, directory, channel, invoker, stderr);
            await worker.CheckHealthAsync(options.StartTimeout, cancellationToken);
            return worker;
        }
        catch (Exception error) when (error is TimeoutException or IOException or RpcException or WorkerStartException)
        {
            Kill(process, directory);
            throw error as WorkerStartException ?? new WorkerStartException(StartFailure(error, options.StartTimeout) + stderr.Describe());
        }
    }

    /// <summary>Names the step that failed and, for a time-out, the limit that ended it.</summary>
    private static string StartFailure(Exception error, TimeSpan limit) => error switch
    {
        TimeoutException => $"the worker did not print its handshake line within the start limit of {limit.TotalSeconds:0.###} s (loading .NET, Kestrel and its plugin); it was killed",
        RpcException { StatusCode: StatusCode.DeadlineExceeded } =>
            $"the worker did not answer its health check within the start limit of {limit.TotalSeconds:0.###} s; it was killed",
        _ => $"the worker did not start: {error.Message}",
    };

    /// <summary>A fresh 0700 folder owned by the worker's uid: its working, home and temporary folder.</summary>
    internal static string CreatePrivateDirectory(int uid)
    {
        var directory = Directory.CreateTempSubdirectory("ch-worker-").FullName;
        // CreateTempSubdirectory already makes it 0700 on Unix; set it explicitly, as the socket's only guard
        // against other users. (Workers are Unix-only: prlimit, unshare and the socket folder's mode.)
        if (!OperatingSystem.IsWindows())
        {
            File.SetUnixFileMode(directory, UnixFileMode.UserRead | UnixFileMode.UserWrite | UnixFileMode.UserExecute);
            FileOwner.Change(directory, uid);
        }

        return directory;
    }

    /// <summary>Waits up to <paramref name="limit"/> for the process to exit; how it ended, or null if it lives on.</summary>
    public async Task<WorkerExit?> ExitAsync(TimeSpan limit)
    {
        try
        {
            await _process.WaitForExitAsync().WaitAsync(limit);
        }
        catch (TimeoutException)
        {
            return null;
        }

        // Give the stderr reader a moment to drain what the runtime printed as it died (e.g. "Stack overflow.").
        await _stderr.DrainedAsync(TimeSpan.FromSeconds(2));
        return new WorkerExit(ExitStatus.WasKilled(_process.ExitCode), $"worker {ExitStatus.Describe(_process.ExitCode)}{_stderr.Describe()}");
    }

    public ValueTask DisposeAsync()
    {
        _channel.Dispose();
        Kill(_process, _directory);
        _process.Dispose();
        return ValueTask.CompletedTask;
    }

    private async Task CheckHealthAsync(TimeSpan limit, CancellationToken cancellationToken)
    {
        var reply = await Health.CheckAsync(new HealthCheckRequest(), deadline: DateTime.UtcNow + limit, cancellationToken: cancellationToken);
        if (reply.Status != HealthCheckResponse.Types.ServingStatus.Serving)
        {
            // Not serving means its plugin loaded no rule in the worker; the worker says why.
            var described = await Client.DescribeAsync(new DescribeRequest(), deadline: DateTime.UtcNow + limit, cancellationToken: cancellationToken);
            throw new WorkerStartException($"the worker reports health {reply.Status}: {(described.Refusal.Length > 0 ? described.Refusal : "its plugin has no rule")}");
        }
    }

    private static GrpcChannel Connect(string socketPath)
    {
        var handler = new SocketsHttpHandler
        {
            ConnectCallback = async (_, token) =>
            {
                var socket = new Socket(AddressFamily.Unix, SocketType.Stream, ProtocolType.Unspecified);
                try
                {
                    await socket.ConnectAsync(new UnixDomainSocketEndPoint(socketPath), token);
                    return new NetworkStream(socket, ownsSocket: true);
                }
                catch
                {
                    socket.Dispose();
                    throw;
                }
            },
        };
        // The address is a placeholder: every connection goes to the socket (aspnetcore/grpc/interprocess-uds.md).
        return GrpcChannel.ForAddress("http://worker", new GrpcChannelOptions { HttpHandler = handler, MaxReceiveMessageSize = 16 * 1024 * 1024 });
    }

    /// <summary>Kills the process tree (if it still runs) and removes its private folder.</summary>
    internal static void Kill(Process process, string directory)
    {
        try
        {
            if (!process.HasExited) process.Kill(entireProcessTree: true);
            process.WaitForExit(TimeSpan.FromSeconds(5));
        }
        catch (InvalidOperationException)
        {
            // Already gone.
        }

        try
        {
            Directory.Delete(directory, recursive: true);
        }
        catch (IOException)
        {
            // A socket file still being unlinked; the OS cleans the temporary folder later.
        }
    }
}

/// <summary>How a worker process ended.</summary>
/// <param name="KilledFromOutside">Ended by SIGKILL that the host did not send: not the plugin's doing.</param>
/// <param name="Description">"worker exited with code 3; last stderr: …", "worker was killed by signal 9 (SIGKILL) …".</param>
internal sealed record WorkerExit(bool KilledFromOutside, string Description)
{
    public override string ToString() => Description;
}

/// <summary>A worker could not be started or did not complete its handshake.</summary>
public sealed class WorkerStartException(string message) : Exception(message);
