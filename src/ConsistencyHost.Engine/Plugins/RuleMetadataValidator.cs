using ConsistencyHost.Sdk.Analyzers.Metadata;
using ConsistencyHost.Sdk.Rules;

namespace ConsistencyHost.Engine.Plugins;

/// <summary>
/// Checks a rule's metadata before the host accepts it, with the very check the CHSDK0002 analyzer runs at
/// build time, so that build and load time never disagree on what a well-formed id or version is.
/// </summary>
internal static class RuleMetadataValidator
{
    /// <summary>Returns every problem with the metadata; empty when it is well formed.</summary>
    public static IReadOnlyList<string> Problems(RuleAttribute metadata) =>
        RuleMetadataFormat.Problems(metadata.Id, metadata.Version, metadata.Title);
}
