using System.Reflection.Metadata;
using System.Reflection.PortableExecutable;

namespace ConsistencyHost.Engine.Vetting;

/// <summary>
/// Vets a compiled plugin assembly against the SDK's banned list and allow-list by reading its metadata and IL, without
/// loading or running it: member and type references used by each method body, P/Invoke declarations,
/// attributes (unsafe code, skipped local initialisation, unsafe accessors), base types, and static fields
/// that hold mutable state. Each problem names the API and the plugin member that uses it.
/// </summary>
/// <remarks>
/// A tripwire, not a security boundary: reflection over strings, hand-written IL and unsafe code in allowed
/// dependencies can hide what is called (see platform notes §4). The metadata reader is not hardened for
/// hostile input either; untrusted plugins belong in a confined worker process.
/// </remarks>
public sealed class CompiledPluginVetter
{
    private readonly HostBannedList _banned;
    private readonly HostAllowedList _allowed;

    private CompiledPluginVetter(HostBannedList banned, HostAllowedList allowed) => (_banned, _allowed) = (banned, allowed);

    /// <summary>A vetter using the banned list and the allow-list embedded in ConsistencyHost.Sdk.</summary>
    public static CompiledPluginVetter Default { get; } = new(HostBannedList.FromSdk, HostAllowedList.FromSdk);

    /// <summary>Vets the assembly at <paramref name="path"/>.</summary>
    public VettingResult Vet(string path)
    {
        using var stream = File.OpenRead(path);
        return Vet(stream);
    }

    /// <summary>Vets an assembly image; the stream is read, not kept.</summary>
    public VettingResult Vet(Stream image)
    {
        using var pe = new PEReader(image, PEStreamOptions.PrefetchEntireImage);
        if (!pe.HasMetadata)
        {
            return new VettingResult([new VettingProblem("CHSDK1001", "a file without .NET metadata", "which cannot be vetted", null)]);
        }

        var scan = new MetadataScan(pe, pe.GetMetadataReader(), _banned, _allowed);
        scan.Run();
        return new VettingResult(scan.Problems);
    }
}
