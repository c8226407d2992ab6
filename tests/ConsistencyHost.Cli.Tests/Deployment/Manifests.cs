using System.Text;
using System.Text.Json;
using ConsistencyHost.Tests.Shared;

namespace ConsistencyHost.Cli.Tests.Deployment;

/// <summary>
/// The Kubernetes objects in deploy/k8s, read by kubectl itself without a cluster: <c>kubectl annotate --local
/// -o json</c> parses every YAML file (refusing malformed ones, objects without kind or apiVersion) and prints
/// each object as JSON; removing an annotation that does not exist changes nothing.
/// </summary>
internal sealed class Manifests
{
    private Manifests(IReadOnlyList<JsonElement> objects) => Objects = objects;

    public static string Folder => Path.Combine(RepoPaths.Root, "deploy", "k8s");

    public IReadOnlyList<JsonElement> Objects { get; }

    public static async Task<Manifests> LoadAsync()
    {
        var (exit, stdout, stderr) = await ChildProcess.RunAsync("kubectl",
            ["annotate", "--local", "-f", Folder, "-o", "json", "consistencyhost.test/unused-"], RepoPaths.Root, TimeSpan.FromSeconds(60));
        Assert.True(exit == 0, $"kubectl could not read {Folder}: {stderr}");
        return new Manifests(ReadConcatenated(stdout));
    }

    /// <summary>The single object of a kind (and name, when given).</summary>
    public JsonElement Single(string kind, string? name = null) =>
        Assert.Single(Objects, o => o.GetProperty("kind").GetString() == kind && (name is null || o.GetProperty("metadata").GetProperty("name").GetString() == name));

    public IEnumerable<JsonElement> OfKind(string kind) => Objects.Where(o => o.GetProperty("kind").GetString() == kind);

    /// <summary>kubectl prints one JSON document per object, one after another.</summary>
    private static List<JsonElement> ReadConcatenated(string text)
    {
        var objects = new List<JsonElement>();
        var reader = new Utf8JsonReader(Encoding.UTF8.GetBytes(text), new JsonReaderOptions { AllowMultipleValues = true });
        while (reader.Read())
        {
            objects.Add(JsonElement.ParseValue(ref reader));
        }

        return objects;
    }
}
