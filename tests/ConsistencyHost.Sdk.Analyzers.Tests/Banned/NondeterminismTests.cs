using Verify = ConsistencyHost.Sdk.Analyzers.Tests.Verify<ConsistencyHost.Sdk.Analyzers.Banned.BannedApiAnalyzer>;

namespace ConsistencyHost.Sdk.Analyzers.Tests.Banned;

public sealed class NondeterminismTests
{
    [Fact]
    public Task Analyze_ClockReads_ReportNondeterminism() =>
        Verify.Analyzer(PluginSource.RuleWithBody("""
            var now = {|#0:DateTime.Now|};
            var utc = {|#1:DateTimeOffset.UtcNow|};
            """),
            Verify.Diagnostic(Descriptors.Nondeterminism).WithLocation(0)
                .WithArguments("System.DateTime.Now", "P:System.DateTime.Now", "nondeterminism: reads the wall clock"),
            Verify.Diagnostic(Descriptors.Nondeterminism).WithLocation(1)
                .WithArguments("System.DateTimeOffset.UtcNow", "P:System.DateTimeOffset.UtcNow", "nondeterminism: reads the wall clock"));

    [Fact]
    public Task Analyze_NewGuidAndUnseededRandom_ReportNondeterminism() =>
        Verify.Analyzer(PluginSource.RuleWithBody("""
            var id = {|#0:Guid.NewGuid()|};
            var random = {|#1:new Random()|};
            """),
            Verify.Diagnostic(Descriptors.Nondeterminism).WithLocation(0)
                .WithArguments("System.Guid.NewGuid()", "M:System.Guid.NewGuid", "nondeterminism: makes a new random identifier"),
            Verify.Diagnostic(Descriptors.Nondeterminism).WithLocation(1)
                .WithArguments("System.Random.Random()", "M:System.Random.#ctor",
                    "nondeterminism: an unseeded generator differs on every run; pass a fixed seed"));

    [Fact]
    public Task Analyze_TickCountOfBannedEnvironment_ReportsTheMoreSpecificNondeterminismEntry() =>
        Verify.Analyzer(PluginSource.RuleWithBody("var ticks = {|#0:Environment.TickCount|};"),
            Verify.Diagnostic(Descriptors.Nondeterminism).WithLocation(0)
                .WithArguments("System.Environment.TickCount", "P:System.Environment.TickCount", "nondeterminism: reads a clock"));

    [Fact]
    public Task Analyze_ParallelQuery_ReportsEachParallelOperator() =>
        Verify.Analyzer(PluginSource.RuleWithBody("var shifts = {|#1:{|#0:entry.Spectra.AsParallel()|}.Count()|};"),
            Verify.Diagnostic(Descriptors.Nondeterminism).WithLocation(0)
                .WithArguments("System.Linq.ParallelEnumerable.AsParallel<ConsistencyHost.Spectra.Model.Spectrum>(System.Collections.Generic.IEnumerable<ConsistencyHost.Spectra.Model.Spectrum>)",
                    "T:System.Linq.ParallelEnumerable", "nondeterminism: parallel queries run in no fixed order"),
            Verify.Diagnostic(Descriptors.Nondeterminism).WithLocation(1)
                .WithArguments("System.Linq.ParallelEnumerable.Count<ConsistencyHost.Spectra.Model.Spectrum>(System.Linq.ParallelQuery<ConsistencyHost.Spectra.Model.Spectrum>)",
                    "T:System.Linq.ParallelEnumerable", "nondeterminism: parallel queries run in no fixed order"));

    [Fact]
    public Task Analyze_SeededRandomAndFixedDates_ReportNothing() =>
        Verify.Analyzer(PluginSource.RuleWithBody("""
            var random = new Random(417);
            var pick = random.Next(10);
            var fixedDate = new DateTime(2024, 5, 1, 0, 0, 0, DateTimeKind.Utc);
            var parsed = Guid.Parse("6f9619ff-8b86-d011-b42d-00c04fc964ff");
            """));
}
