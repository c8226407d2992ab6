using ConsistencyHost.Engine.Plugins;
using ConsistencyHost.Sdk.Entries;
using ConsistencyHost.Spectra.Model;

namespace ConsistencyHost.Engine.Running;

/// <summary>
/// Decides before a run whether a rule has anything to check, so that a rule with nothing to look at ends as
/// skipped with the reason rather than as a clean pass: an entry without the spectra a rule declares it needs
/// (<c>[Rule(Nuclei = …)]</c>), or an entry with no spectra and no claims at all.
/// </summary>
internal static class RuleApplicability
{
    /// <summary>Why <paramref name="rule"/> has nothing to check in <paramref name="entry"/>; null when it has.</summary>
    public static string? SkipReason(RuleDescriptor rule, IEntryView entry)
    {
        if (entry.Spectra.Count == 0 && entry.Claims.Formula is null && entry.Claims.Hrms.Count == 0)
        {
            return "the entry has no spectra, no formula and no HRMS claim";
        }

        if (rule.Nuclei.Count == 0) return null;
        foreach (var spectrum in entry.Spectra)
        {
            if (Needs(rule, spectrum.Nucleus)) return null;
        }

        return $"the entry has no {string.Join(" or ", rule.Nuclei)} spectrum";
    }

    private static bool Needs(RuleDescriptor rule, Nucleus nucleus)
    {
        var label = nucleus.ToLabel();
        foreach (var needed in rule.Nuclei)
        {
            if (string.Equals(needed, label, StringComparison.OrdinalIgnoreCase)) return true;
        }

        return false;
    }
}
