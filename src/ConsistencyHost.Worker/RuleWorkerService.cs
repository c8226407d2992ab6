using System.Text.Json;
using ConsistencyHost.Contract.Mapping;
using ConsistencyHost.Contract.Worker.V1;
using ConsistencyHost.Engine.Intake;
using ConsistencyHost.Engine.Running;
using ConsistencyHost.Engine.Plugins;
using Grpc.Core;

namespace ConsistencyHost.Worker;

/// <summary>
/// Runs the worker's rules. A rule's exception is a failed reply; a stack overflow or an exit takes the
/// process down, which the host reports as a crash; an overrun is ended by the host killing the process.
/// </summary>
internal sealed class RuleWorkerService(LoadedPlugin plugin) : RuleWorker.RuleWorkerBase
{
    private readonly EntryIntake _intake = new(IntakeLimits.Default);

    public override Task<DescribeResponse> Describe(DescribeRequest request, ServerCallContext context) =>
        Task.FromResult(RuleDescriber.Describe(plugin, request));

    public override Task<RunRuleResponse> RunRule(RunRuleRequest request, ServerCallContext context)
    {
        if (!plugin.Rules.TryGetValue(request.RuleId, out var rule))
        {
            return Task.FromResult(Failed($"this worker has no rule '{request.RuleId}'{(plugin.Refusal.Length > 0 ? ": " + plugin.Refusal : "")}"));
        }

        using var deadline = CancellationTokenSource.CreateLinkedTokenSource(context.CancellationToken);
        try
        {
            return Task.FromResult(Run(rule, request, deadline));
        }
        catch (OperationCanceledException) when (deadline.IsCancellationRequested && !context.CancellationToken.IsCancellationRequested)
        {
            // The deadline fired and the rule observed its token and stopped.
            return Task.FromResult(new RunRuleResponse { Ok = false, TimedOut = true, Message = $"stopped at its deadline of {request.DeadlineMs} ms" });
        }
        catch (Exception error) when (error is not OperationCanceledException || !context.CancellationToken.IsCancellationRequested)
        {
            // Any exception is the rule's failure, reported as data; the worker itself carries on. That includes an
            // OperationCanceledException the rule threw of its own accord before its deadline: not a time-out.
            return Task.FromResult(Failed($"{error.GetType().Name}: {error.Message}"));
        }
    }

    private RunRuleResponse Run(RuleDescriptor rule, RunRuleRequest request, CancellationTokenSource deadline)
    {
        // Read leniently: the host has already refused the entry if it asked for strict reading, and a lenient read
        // of text that reads strictly gives the same entry.
        var entry = _intake.Build(SubmissionMapper.ToSubmission(request.Entry), textNotes: []);
        var options = JsonSerializer.Deserialize(request.OptionsJson, rule.OptionsType!)
                      ?? throw new JsonException($"options for '{rule.Id}' deserialised to null");
        // As in the host: the perception every rule shares is not this rule's work, so it is done before its clock starts.
        SharedPerception.Prepare(entry);
        deadline.CancelAfter(TimeSpan.FromMilliseconds(Math.Max(1, request.DeadlineMs)));
        var response = new RunRuleResponse { Ok = true };
        foreach (var finding in rule.Factory!().Check(entry, options, deadline.Token))
        {
            deadline.Token.ThrowIfCancellationRequested();
            response.Findings.Add(ReportMapper.ToWire(finding));
        }

        return response;
    }

    private static RunRuleResponse Failed(string message) => new() { Ok = false, Message = message };
}
