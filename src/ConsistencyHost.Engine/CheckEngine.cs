using ConsistencyHost.Engine.Intake;
using ConsistencyHost.Engine.Plugins;
using ConsistencyHost.Engine.Profiles;
using ConsistencyHost.Engine.Reports;
using ConsistencyHost.Engine.Running;

namespace ConsistencyHost.Engine;

/// <summary>
/// The embedded engine: loads the plugins once, resolves the profiles once, then checks entries. Shared by
/// the gRPC host and the command line; thread-safe.
/// </summary>
public sealed class CheckEngine
{
    private readonly IReadOnlyDictionary<string, ResolvedProfile> _profiles;
    private readonly EntryIntake _intake;
    private readonly RuleRunner _runner = new();

    /// <summary>Discovers plugins and validates every profile; throws <see cref="ProfileConfigurationException"/>.</summary>
    public CheckEngine(EngineOptions options, IntakeLimits? limits = null)
    {
        Options = options;
        Rules = PluginDiscovery.Discover(options.PluginsPath, options.SourcePluginCachePath);
        _profiles = ProfileResolver.ResolveAll(options, Rules);
        _intake = new EntryIntake(limits ?? IntakeLimits.Default);
    }

    /// <summary>The options the engine was built with.</summary>
    public EngineOptions Options { get; }

    /// <summary>Every discovered rule, loaded or refused, ordered by id.</summary>
    public IReadOnlyList<RuleDescriptor> Rules { get; }

    /// <summary>Names of the resolved profiles.</summary>
    public IReadOnlyCollection<string> ProfileNames => [.. _profiles.Keys.Order(StringComparer.Ordinal)];

    /// <summary>The resolved profile by name, for display.</summary>
    public ResolvedProfile GetProfile(string? name) => ResolveProfile(name);

    /// <summary>Checks one entry; throws <see cref="EntryInputException"/> when it cannot be read at all.</summary>
    public CheckReport Check(EntrySubmission submission, CancellationToken cancellationToken = default)
    {
        var profile = ResolveProfile(submission.Profile);
        var entry = _intake.Build(submission);
        var (findings, runs) = _runner.Run(entry, profile, cancellationToken);
        return new CheckReport
        {
            EntryId = submission.EntryId,
            Profile = profile.Name,
            Findings = [.. findings.OrderBy(f => f.RuleId, StringComparer.Ordinal)],
            RuleRuns = [.. runs.OrderBy(r => r.RuleId, StringComparer.Ordinal)],
            Structure = entry.Perception is { } perception
                ? new StructureSummary(perception.Formula.Hill, perception.Molecule.AtomCount, perception.Formula.MonoisotopicMass)
                : null,
        };
    }

    private ResolvedProfile ResolveProfile(string? name)
    {
        var key = string.IsNullOrWhiteSpace(name) ? Options.DefaultProfile : name.Trim();
        return _profiles.TryGetValue(key, out var profile)
            ? profile
            : throw new EntryInputException("profile", $"unknown profile '{key}'; defined profiles: {string.Join(", ", ProfileNames)}");
    }
}
