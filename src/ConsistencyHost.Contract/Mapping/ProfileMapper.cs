using ConsistencyHost.Contract.V1;
using ConsistencyHost.Engine;
using ConsistencyHost.Engine.Profiles;

namespace ConsistencyHost.Contract.Mapping;

/// <summary>
/// Maps an engine's profiles onto the wire for ListProfiles: what each profile's configuration states (not the
/// options' effective values, which `consistencyhost profiles` prints), and which rules run under it.
/// </summary>
public static class ProfileMapper
{
    /// <summary>Every profile of <paramref name="engine"/>, ordered by name.</summary>
    public static ListProfilesResponse ToProfileList(CheckEngine engine)
    {
        var response = new ListProfilesResponse { DefaultProfile = engine.Options.DefaultProfile };
        var configured = ProfileResolver.WithDefault(engine.Options).ToDictionary(p => p.Name, StringComparer.Ordinal);
        foreach (var name in engine.ProfileNames)
        {
            response.Profiles.Add(ToWire(configured[name], engine.GetProfile(name), engine.Options.DefaultProfile));
        }

        return response;
    }

    private static ProfileInfo ToWire(Profile profile, ResolvedProfile resolved, string defaultName)
    {
        var info = new ProfileInfo
        {
            Name = profile.Name,
            Description = profile.Description ?? "",
            IsDefault = profile.Name == defaultName,
            OnlyListedRules = profile.OnlyListedRules,
            StrictText = profile.StrictText,
        };
        info.Rules.AddRange(profile.Rules.OrderBy(r => r.Key, StringComparer.Ordinal).Select(r => ToWire(r.Key, r.Value)));
        info.ActiveRules.AddRange(resolved.Rules.Select(r => r.Descriptor.Id).Order(StringComparer.Ordinal));
        return info;
    }

    private static ProfileRuleSettings ToWire(string ruleId, RuleSettings settings)
    {
        var wire = new ProfileRuleSettings
        {
            RuleId = ruleId,
            Enabled = settings.Enabled,
            DeadlineMs = settings.Deadline is { } deadline ? (int)deadline.TotalMilliseconds : 0,
        };
        foreach (var (name, value) in settings.Options) wire.Options[name] = value;
        foreach (var (code, severity) in settings.Severities) wire.Severities[code] = ReportMapper.ToWire(severity);
        return wire;
    }
}
