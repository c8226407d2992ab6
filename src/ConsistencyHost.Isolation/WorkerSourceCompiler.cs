using System.Diagnostics;
using System.Text.Json;
using ConsistencyHost.Engine.Vetting;

namespace ConsistencyHost.Isolation;

/// <summary>
/// Compiles a source plugin in a one-shot worker process (<c>ConsistencyHost.Worker --compile NAME</c>) under the
/// workers' confinement (no network, a uid of its own from the workers' range, a clean environment, RLIMIT_AS) with its own managed heap
/// limit (<see cref="IsolationOptions.CompileHeapBytes"/>) and wall-time limit (<see cref="IsolationOptions.CompileTimeout"/>).
/// Whatever the compiler does — throw, abort out of memory, loop — the host gets a refusal naming what happened and
/// the limit, and carries on with its other plugins. The image that comes back is vetted by the host.
/// </summary>
internal sealed class WorkerSourceCompiler(IsolationOptions options, WorkerUsers users) : ISourceCompilation
{
    /// <summary>
    /// The largest reply read from the compiler: a base64 image of a plugin whose sources are at most
    /// <see cref="SourcePluginCompiler.MaxSourceBytes"/>. Metadata heaps cap what a megabyte of source can emit
    /// (16 MB of user strings, from memory of ECMA-335 II.24.2.4), so 64 MB only stops a worker that floods the pipe.
    /// </summary>
    private const int MaxReplyBytes = 64 * 1024 * 1024;

    /// <inheritdoc />
    public SourceImage Compile(string assemblyName, IReadOnlyList<SourceFile> sources) =>
        // Task.Run: discovery is synchronous; no caller's synchronisation context is captured by the awaits below.
        Task.Run(() => CompileAsync(assemblyName, sources)).GetAwaiter().GetResult();

    private async Task<SourceImage> CompileAsync(string assemblyName, IReadOnlyList<SourceFile> sources)
    {
        int uid;
        try
        {
            // A fresh uid per compilation: hostile source never compiles under the host's uid or a running worker's.
            uid = users.Next();
        }
        catch (WorkerStartException error)
        {
            return Failed(error.Message);
        }

        var directory = WorkerProcess.CreatePrivateDirectory(uid);
        Process? process = null;
        try
        {
            process = Process.Start(WorkerCommand.Build(options, uid, ["--compile", assemblyName], directory, options.CompileHeapBytes));
            if (process is null) return Failed("could not be started");
            var stderr = new StderrTail(process);
            using var limit = new CancellationTokenSource(options.CompileTimeout);
            try
            {
                var reply = ReadCappedAsync(process.StandardOutput.BaseStream, limit.Token);
                await SendAsync(process, sources, limit.Token);
                await process.WaitForExitAsync(limit.Token);
                var bytes = await reply;
                await stderr.DrainedAsync(TimeSpan.FromSeconds(2));
                return process.ExitCode == 0 ? Parse(bytes) : Failed($"{ExitStatus.Describe(process.ExitCode)}{Limits}{stderr.Describe()}");
            }
            catch (OperationCanceledException) when (limit.IsCancellationRequested)
            {
                return SourceImage.Refused(SourceImage.TimeLimitCode, "the compiler process",
                    $"compiling took longer than the limit of {options.CompileTimeout.TotalSeconds:0} s (Isolation:CompileTimeoutSeconds); the compiler process was killed");
            }
            catch (IOException error)
            {
                // The worker closed its standard input early: it died; its exit says how.
                await process.WaitForExitAsync(CancellationToken.None).WaitAsync(TimeSpan.FromSeconds(5));
                return Failed($"{ExitStatus.Describe(process.ExitCode)} while reading its sources ({error.Message}){Limits}{stderr.Describe()}");
            }
        }
        catch (Exception error) when (error is System.ComponentModel.Win32Exception or TimeoutException)
        {
            return Failed($"could not be run: {error.Message}");
        }
        finally
        {
            if (process is not null)
            {
                WorkerProcess.Kill(process, directory);
                process.Dispose();
            }
            else
            {
                Directory.Delete(directory, recursive: true);
            }
        }
    }

    private string Limits =>
        $" (limits: managed heap {options.CompileHeapBytes / (1024 * 1024)} MB (Isolation:CompileHeapMegabytes), address space {options.AddressSpaceBytes / (1024 * 1024)} MB)";

    private static SourceImage Failed(string what) => SourceImage.Refused(SourceImage.CompilerFailureCode, "the compiler process", what);

    private static async Task SendAsync(Process process, IReadOnlyList<SourceFile> sources, CancellationToken cancellationToken)
    {
        await JsonSerializer.SerializeAsync(process.StandardInput.BaseStream, new SourceCompileRequest(sources), SourceCompileRequest.Json, cancellationToken);
        process.StandardInput.Close();
    }

    private static async Task<byte[]?> ReadCappedAsync(Stream output, CancellationToken cancellationToken)
    {
        using var buffer = new MemoryStream();
        var chunk = new byte[81920];
        int read;
        while ((read = await output.ReadAsync(chunk, cancellationToken)) > 0)
        {
            if (buffer.Length + read > MaxReplyBytes) return null;
            buffer.Write(chunk, 0, read);
        }

        return buffer.ToArray();
    }

    /// <summary>The reply comes from a process that compiled hostile source: read as untrusted input.</summary>
    private static SourceImage Parse(byte[]? reply)
    {
        if (reply is null) return Failed($"wrote more than {MaxReplyBytes / (1024 * 1024)} MB to its standard output");
        try
        {
            var image = JsonSerializer.Deserialize<SourceImage>(reply, SourceCompileRequest.Json);
            return image is { Problems: not null } ? image : Failed("replied with an empty result");
        }
        catch (JsonException error)
        {
            return Failed($"replied with malformed JSON: {error.Message}");
        }
    }
}
