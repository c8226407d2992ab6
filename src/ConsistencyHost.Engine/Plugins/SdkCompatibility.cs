using System.Reflection.Metadata;
using System.Reflection.PortableExecutable;
using ConsistencyHost.Sdk.Rules;

namespace ConsistencyHost.Engine.Plugins;

/// <summary>
/// Refuses a plugin built against a newer major version of the SDK than the host carries, reading the
/// assembly's references through metadata without loading it.
/// </summary>
internal static class SdkCompatibility
{
    private static readonly Version HostSdkVersion = typeof(IRule).Assembly.GetName().Version ?? new Version(1, 0);

    /// <summary>Returns the refusal reason, or null when the plugin may be loaded.</summary>
    public static string? Check(string assemblyPath)
    {
        using var stream = File.OpenRead(assemblyPath);
        using var reader = new PEReader(stream);
        if (!reader.HasMetadata)
        {
            return "is not a .NET assembly";
        }

        var metadata = reader.GetMetadataReader();
        foreach (var handle in metadata.AssemblyReferences)
        {
            var reference = metadata.GetAssemblyReference(handle);
            if (metadata.GetString(reference.Name) == "ConsistencyHost.Sdk" && reference.Version.Major > HostSdkVersion.Major)
            {
                return $"was built against ConsistencyHost.Sdk {reference.Version}, newer than this host's SDK {HostSdkVersion.Major}.x; " +
                       "update the host or rebuild the plugin against SDK " + HostSdkVersion.Major;
            }
        }

        return null;
    }
}
