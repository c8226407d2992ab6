using System;
using System.IO;
using System.Reflection;

namespace ConsistencyHost.Sdk.Analyzers;

/// <summary>Reads one of the API lists (banned, allowed) that the SDK and the analyzers both embed.</summary>
public static class ApiListResource
{
    /// <summary>The text of the resource <paramref name="name"/> in <paramref name="assembly"/>; throws naming what is missing.</summary>
    public static string Read(Assembly assembly, string name)
    {
        using var stream = assembly.GetManifestResourceStream(name)
                           ?? throw new InvalidOperationException($"{assembly.GetName().Name} lacks its resource {name}");
        using var reader = new StreamReader(stream);
        return reader.ReadToEnd();
    }
}
