using System.Text.Json;

namespace ConsistencyHost.Engine.Vetting;

/// <summary>
/// What the host sends a compiling worker on its standard input: the sources as the host read (and hashed)
/// them, so the worker compiles exactly what the cache key names and needs no access to the plugin folder.
/// The reply is a <see cref="SourceImage"/> in the same JSON form.
/// </summary>
public sealed record SourceCompileRequest(IReadOnlyList<SourceFile> Sources)
{
    /// <summary>The JSON form both ends use.</summary>
    public static JsonSerializerOptions Json { get; } = new(JsonSerializerDefaults.Web);
}
