using System.Diagnostics;
using ConsistencyHost.Engine.Intake;
using ConsistencyHost.Engine.Plugins;
using ConsistencyHost.Engine.Profiles;
using ConsistencyHost.Engine.Reports;
using ConsistencyHost.Engine.Running;
using ConsistencyHost.Engine.Telemetry;

namespace ConsistencyHost.Engine;

/// <summary>
/// The embedded engine: loads the plugins once, resolves the profiles once, then checks entries. Shared by
/// the gRPC host and the command line; thread-safe.
/// </summary>
public sealed class CheckEngine
{
    private readonly IReadOnlyDictionary<string, ResolvedProfile> _profiles;
    private readonly EntryIntake _intake;
    private readonly RuleRunner _runner;
    private readonly IRuleExecutor? _isolated;

    /// <summary>Discovers plugins and validates every profile; throws <see cref="ProfileConfigurationException"/>.</summary>
    /// <param name="options">Plugin folder, profiles, deadlines and the trusted plugins.</param>
    /// <param name="limits">Intake limits; null for the defaults.</param>
    /// <param name="isolatedExecutor">Describes and runs untrusted plugins out of process; null loads and runs every plugin in-process.</param>
    public CheckEngine(EngineOptions options, IntakeLimits? limits = null, IRuleExecutor? isolatedExecutor = null)
    {
        Options = options;
        // With workers on, untrusted plugins are described by their workers and never loaded here; without,
        // every plugin's code (constructors, options validation, rules) runs in this process.
        var untrusted = isolatedExecutor is null
            ? null
            : new UntrustedPlugins(options.TrustedPlugins.Contains, isolatedExecutor, ProfileResolver.WithDefault(options));
        Rules = [.. PluginDiscovery.Discover(options.PluginsPath, options.SourcePluginCachePath, untrusted).Select(rule => WithTrust(rule, options))];
        _profiles = ProfileResolver.ResolveAll(options, Rules);
        _intake = new EntryIntake(limits ?? IntakeLimits.Default);
        _isolated = isolatedExecutor;
        _runner = new RuleRunner(isolatedExecutor, options.ReportLimits);
    }

    /// <summary>Where a loaded rule runs: "in-process" or "worker".</summary>
    public string IsolationOf(RuleDescriptor rule) => _isolated is not null && !rule.IsTrusted ? "worker" : "in-process";

    /// <summary>Why a rule is currently held back (its plugin is quarantined after repeated crashes), or null.</summary>
    public string? HeldBackReason(RuleDescriptor rule) => _isolated is not null && !rule.IsTrusted ? _isolated.HeldBackReason(rule) : null;

    /// <summary>The options the engine was built with.</summary>
    public EngineOptions Options { get; }

    /// <summary>Every discovered rule, loaded or refused, ordered by id.</summary>
    public IReadOnlyList<RuleDescriptor> Rules { get; }

    /// <summary>Names of the resolved profiles.</summary>
    public IReadOnlyCollection<string> ProfileNames => [.. _profiles.Keys.Order(StringComparer.Ordinal)];

    /// <summary>The resolved profile by name, for display.</summary>
    public ResolvedProfile GetProfile(string? name) => ResolveProfile(name);

    /// <summary>Checks one entry; throws <see cref="EntryInputException"/> when it cannot be read at all.</summary>
    /// <remarks>Measured and traced through <see cref="EngineTelemetry"/> (free when nobody listens).</remarks>
    public CheckReport Check(EntrySubmission submission, CancellationToken cancellationToken = default)
    {
        var started = Stopwatch.GetTimestamp();
        using var activity = EngineTelemetry.StartCheck(submission.EntryId, submission.RequestId);
        CheckReport report;
        try
        {
            report = Run(submission, cancellationToken);
        }
        catch (EntryInputException error)
        {
            EngineTelemetry.CheckRefused(activity, error.Field);
            throw;
        }

        EngineTelemetry.CheckEnded(activity, report, Stopwatch.GetElapsedTime(started));
        return report;
    }

    private CheckReport Run(EntrySubmission submission, CancellationToken cancellationToken)
    {
        var profile = ResolveProfile(submission.Profile);
        // Strict when the request or the profile asks; otherwise unreadable fragments become findings.
        List<ReportedFinding>? textNotes = submission.StrictText || profile.StrictText ? null : [];
        var entry = _intake.Build(submission, textNotes);
        if (profile.Rules.Any(rule => !_runner.RunsIsolated(rule)))
        {
            SharedPerception.Prepare(entry);
        }

        var (findings, runs) = _runner.Run(entry, submission, profile, cancellationToken);
        return new CheckReport
        {
            EntryId = submission.EntryId,
            Profile = profile.Name,
            Findings = [.. (textNotes is { Count: > 0 } ? findings.Concat(textNotes) : findings).OrderBy(f => f.RuleId, StringComparer.Ordinal)],
            RuleRuns = [.. runs.OrderBy(r => r.RuleId, StringComparer.Ordinal)],
            Structure = entry.Perception is { } perception
                ? new StructureSummary(perception.Formula.Hill, perception.Molecule.AtomCount, perception.Formula.MonoisotopicMass)
                : null,
        };
    }

    private static RuleDescriptor WithTrust(RuleDescriptor rule, EngineOptions options) =>
        rule with { IsTrusted = !PluginDiscovery.IsSourcePlugin(rule.Plugin) && options.TrustedPlugins.Contains(rule.PluginName) };

    private ResolvedProfile ResolveProfile(string? name)
    {
        var key = string.IsNullOrWhiteSpace(name) ? Options.DefaultProfile : name.Trim();
        return _profiles.TryGetValue(key, out var profile)
            ? profile
            : throw new EntryInputException("profile", $"unknown profile '{key}'; defined profiles: {string.Join(", ", ProfileNames)}");
    }
}
