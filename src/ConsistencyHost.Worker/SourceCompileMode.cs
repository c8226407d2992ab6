using System.Text.Json;
using ConsistencyHost.Engine.Vetting;

namespace ConsistencyHost.Worker;

/// <summary>
/// <c>--compile NAME</c>: the worker as a one-shot compiler of a source plugin, so that Roslyn runs on hostile
/// source under the worker's limits (time, managed heap, address space, no network, another user) instead of in
/// the host. Reads <see cref="SourceCompileRequest"/> as JSON from standard input to its end, writes one
/// <see cref="SourceImage"/> as JSON to standard output and exits 0. Anything else — an exception, running out
/// of memory, being killed at the time limit — is a non-zero exit the host reports with the limit.
/// </summary>
internal static class SourceCompileMode
{
    public const string Flag = "--compile";

    public static async Task<int> RunAsync(string assemblyName)
    {
        var request = await JsonSerializer.DeserializeAsync<SourceCompileRequest>(Console.OpenStandardInput(), SourceCompileRequest.Json);
        if (request is null)
        {
            await Console.Error.WriteLineAsync("consistencyhost worker: no sources on standard input");
            return 2;
        }

        // No cancellation: the host kills this process at its time limit, which no compiler loop can ignore.
        var image = SourcePluginCompiler.CompileImage(assemblyName, request.Sources, CancellationToken.None);
        await using var output = Console.OpenStandardOutput();
        await JsonSerializer.SerializeAsync(output, image, SourceCompileRequest.Json);
        return 0;
    }
}
