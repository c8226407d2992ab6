using ConsistencyHost.Contract.V1;
using ConsistencyHost.Engine.Plugins;
using ConsistencyHost.Engine.Reports;
using EngineStatus = ConsistencyHost.Engine.Reports.RuleRunStatus;
using SdkSeverity = ConsistencyHost.Sdk.Findings.Severity;
using WireSeverity = ConsistencyHost.Contract.V1.Severity;
using WireStatus = ConsistencyHost.Contract.V1.RuleRunStatus;

namespace ConsistencyHost.Contract.Mapping;

/// <summary>Maps the engine's report and rule catalogue onto the wire messages.</summary>
public static class ReportMapper
{
    /// <summary>Maps one report.</summary>
    public static CheckEntryResponse ToResponse(CheckReport report)
    {
        var response = new CheckEntryResponse
        {
            EntryId = report.EntryId,
            Profile = report.Profile,
            HighestSeverity = report.HighestSeverity is { } highest ? ToWire(highest) : WireSeverity.Unspecified,
        };
        response.Findings.AddRange(report.Findings.Select(ToWire));
        response.RuleRuns.AddRange(report.RuleRuns.Select(ToWire));
        if (report.Structure is { } structure)
        {
            response.Structure = new V1.StructureSummary
            {
                Formula = structure.Formula,
                HeavyAtoms = structure.HeavyAtoms,
                MonoisotopicMass = structure.MonoisotopicMass,
            };
        }

        return response;
    }

    /// <summary>Maps the reply for an entry that could not be read, as sent inside a stream.</summary>
    public static CheckEntryResponse ToInputErrorResponse(string entryId, string field, string reason) => new()
    {
        EntryId = entryId,
        InputError = new InputError { Field = field, Reason = reason },
    };

    /// <summary>Maps the rule catalogue of an engine: where each rule runs, quarantined rules with the reason, the engine's version.</summary>
    public static ListRulesResponse ToRuleList(Engine.CheckEngine engine)
    {
        var list = ToRuleList(engine.Rules, engine.IsolationOf, engine.HeldBackReason);
        list.EngineVersion = Engine.BuildVersion.Engine;
        return list;
    }

    /// <summary>Maps the rule catalogue.</summary>
    public static ListRulesResponse ToRuleList(
        IEnumerable<RuleDescriptor> rules, Func<RuleDescriptor, string>? isolation = null, Func<RuleDescriptor, string?>? heldBack = null)
    {
        var response = new ListRulesResponse();
        foreach (var rule in rules)
        {
            var held = rule.IsLoaded ? heldBack?.Invoke(rule) : null;
            var info = new RuleInfo
            {
                Id = rule.Id,
                Version = rule.Version,
                Title = rule.Title,
                Plugin = rule.Plugin,
                LoadStatus = !rule.IsLoaded ? RuleLoadStatus.Refused : held is null ? RuleLoadStatus.Loaded : RuleLoadStatus.Quarantined,
                LoadMessage = held ?? rule.LoadMessage,
                Isolation = rule.IsLoaded ? isolation?.Invoke(rule) ?? "in-process" : "",
            };
            info.Nuclei.AddRange(rule.Nuclei);
            response.Rules.Add(info);
        }

        return response;
    }

    private static Finding ToWire(ReportedFinding reported)
    {
        var wire = ToWire(reported.Finding);
        wire.RuleId = reported.RuleId;
        wire.RuleVersion = reported.RuleVersion;
        return wire;
    }

    /// <summary>Maps a rule's finding without its rule stamp (the worker sends findings this way).</summary>
    public static Finding ToWire(Sdk.Findings.Finding finding)
    {
        var wire = new Finding
        {
            Code = finding.Code,
            Severity = ToWire(finding.Severity),
            Message = finding.Message,
        };
        wire.Atoms.AddRange(finding.Atoms);
        wire.Peaks.AddRange(finding.Peaks.Select(p => new PeakRef { Spectrum = p.Spectrum, Signal = p.Signal }));
        wire.Evidence.AddRange(finding.Evidence.Select(e => new Evidence { Name = e.Key, Value = e.Value }));
        return wire;
    }

    private static RuleRun ToWire(RuleRunRecord run) => new()
    {
        RuleId = run.RuleId,
        RuleVersion = run.RuleVersion,
        Status = run.Status switch
        {
            EngineStatus.Ok => WireStatus.Ok,
            EngineStatus.Failed => WireStatus.Failed,
            EngineStatus.TimedOut => WireStatus.TimedOut,
            EngineStatus.Skipped => WireStatus.Skipped,
            EngineStatus.Crashed => WireStatus.Crashed,
            EngineStatus.Quarantined => WireStatus.Quarantined,
            _ => WireStatus.RunStatusUnspecified,
        },
        ElapsedMs = run.Elapsed.TotalMilliseconds,
        Message = run.Message,
        FindingCount = run.FindingCount,
    };

    /// <summary>Maps a severity onto the wire.</summary>
    public static WireSeverity ToWire(SdkSeverity severity) => severity switch
    {
        SdkSeverity.Info => WireSeverity.Info,
        SdkSeverity.Warning => WireSeverity.Warning,
        SdkSeverity.Error => WireSeverity.Error,
        _ => WireSeverity.Unspecified,
    };
}
