using Verify = ConsistencyHost.Sdk.Analyzers.Tests.Verify<ConsistencyHost.Sdk.Analyzers.Banned.BannedApiAnalyzer>;
using VerifyAllowed = ConsistencyHost.Sdk.Analyzers.Tests.Verify<ConsistencyHost.Sdk.Analyzers.Allowed.AllowListAnalyzer>;

namespace ConsistencyHost.Sdk.Analyzers.Tests.Allowed;

/// <summary>
/// The APIs issue 14 names as out that the banned list already names with a reason (timers, Console, Unsafe):
/// the banned-API analyzer reports them (CHSDK1001) and the allow-list analyzer stays silent, so each use is
/// reported once.
/// </summary>
public sealed class BannedOutsTests
{
    private const string Body = """
        using var timer = {|#0:new System.Threading.Timer(_ => { }, null, 10, 10)|};
        using var elapsed = {|#1:new System.Timers.Timer(10)|};
        {|#2:Console.WriteLine("x")|};
        var one = 1;
        ref var same = ref {|#3:System.Runtime.CompilerServices.Unsafe.AsRef(in one)|};
        """;

    [Fact]
    public Task Analyze_TimersConsoleUnsafe_AreBannedWithTheirReasons() =>
        Verify.Analyzer(PluginSource.RuleWithBody(Body),
            Verify.Diagnostic(Descriptors.BannedApi).WithLocation(0).WithArguments(
                "System.Threading.Timer.Timer(System.Threading.TimerCallback, object?, int, int)", "T:System.Threading.Timer", "threading: runs code later, outside the rule's run"),
            Verify.Diagnostic(Descriptors.BannedApi).WithLocation(1).WithArguments(
                "System.Timers.Timer.Timer(double)", "N:System.Timers", "threading: runs code later, outside the rule's run"),
            Verify.Diagnostic(Descriptors.BannedApi).WithLocation(2).WithArguments(
                "System.Console.WriteLine(string?)", "T:System.Console", "console: writes to the host's console; return findings instead"),
            Verify.Diagnostic(Descriptors.BannedApi).WithLocation(3).WithArguments(
                "System.Runtime.CompilerServices.Unsafe.AsRef<int>(scoped ref readonly int)", "T:System.Runtime.CompilerServices.Unsafe", "unsafe: bypasses type and memory safety"));

    [Fact]
    public Task Analyze_TimersConsoleUnsafe_AllowListAnalyzerLeavesThemToTheBannedList() =>
        VerifyAllowed.Analyzer(PluginSource.RuleWithBody(Body.Replace("{|#0:", "").Replace("{|#1:", "").Replace("{|#2:", "").Replace("{|#3:", "").Replace("|}", "")));
}
