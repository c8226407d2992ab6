using ConsistencyHost.Sdk.Analyzers;
using ConsistencyHost.Sdk.Analyzers.Banned;
using ConsistencyHost.Sdk.Rules;

namespace ConsistencyHost.Engine.Vetting;

/// <summary>
/// The banned list as the host reads it: from the SDK assembly's resource, the very file the analyzers
/// embed, with lookups by documentation id for the metadata scan.
/// </summary>
internal sealed class HostBannedList
{
    private readonly Dictionary<string, BannedApiEntry> _byId;

    public HostBannedList(BannedApiList list) =>
        _byId = list.Entries.ToDictionary(e => e.DocumentationId, StringComparer.Ordinal);

    /// <summary>The list embedded in ConsistencyHost.Sdk.</summary>
    public static HostBannedList FromSdk { get; } = new(BannedApiList.Parse(ApiListResource.Read(typeof(IRule).Assembly, BannedApiList.ResourceName)));

    /// <summary>The entry with exactly this id, or null.</summary>
    public BannedApiEntry? ById(string documentationId) => _byId.GetValueOrDefault(documentationId);

    /// <summary>The most specific entry for a member id (<c>M:</c>, <c>P:</c>, …) declared on <paramref name="type"/>.</summary>
    public BannedApiEntry? FindMember(IEnumerable<string> memberIds, MetadataTypeName type) =>
        memberIds.Select(ById).FirstOrDefault(e => e is not null) ?? FindType(type);

    /// <summary>The entry that bans a type, a type it is nested in, or its namespace.</summary>
    public BannedApiEntry? FindType(MetadataTypeName type)
    {
        foreach (var name in type.SelfAndContainers())
        {
            if (ById("T:" + name) is { } entry) return entry;
        }

        return type.NamespaceAndParents().Select(ns => ById("N:" + ns)).FirstOrDefault(entry => entry is not null);
    }
}
