using Verify = ConsistencyHost.Sdk.Analyzers.Tests.Verify<ConsistencyHost.Sdk.Analyzers.Contract.CancellationTokenAnalyzer>;

namespace ConsistencyHost.Sdk.Analyzers.Tests.Contract;

public sealed class CancellationTokenAnalyzerTests
{
    [Fact]
    public Task Analyze_CheckThatNeverLooksAtItsToken_ReportsIgnoredCancellation() =>
        Verify.Analyzer("""
            [Rule("lab-rule", "1.0.0", "A lab rule")]
            public sealed class Busy : Rule<NoOptions>
            {
                protected override IEnumerable<Finding> Check(IEntryView entry, NoOptions options, CancellationToken {|#0:cancellationToken|})
                {
                    foreach (var spectrum in entry.Spectra) { yield return new Finding("c", Severity.Info, "m"); }
                }
            }
            """,
            Verify.Diagnostic(Descriptors.CancellationIgnored).WithLocation(0).WithArguments("Busy.Check", "cancellationToken"));

    [Fact]
    public Task Analyze_DirectIRuleImplementationIgnoringToken_ReportsIgnoredCancellation() =>
        Verify.Analyzer("""
            [Rule("lab-rule", "1.0.0", "A lab rule")]
            public sealed class Direct : IRule
            {
                public Type OptionsType => typeof(NoOptions);
                public IEnumerable<Finding> Check(IEntryView entry, object options, CancellationToken {|#0:token|}) => [];
            }
            """,
            Verify.Diagnostic(Descriptors.CancellationIgnored).WithLocation(0).WithArguments("Direct.Check", "token"));

    [Fact]
    public Task Analyze_TokenPassedOnOrChecked_ReportsNothing() =>
        Verify.Analyzer("""
            [Rule("lab-rule", "1.0.0", "A lab rule")]
            public sealed class Careful : Rule<NoOptions>
            {
                protected override IEnumerable<Finding> Check(IEntryView entry, NoOptions options, CancellationToken cancellationToken) =>
                    entry.Spectra.Select(_ => Inspect(cancellationToken)).Where(f => f is not null).Select(f => f!);

                private static Finding? Inspect(CancellationToken token) => token.IsCancellationRequested ? null : null;
            }
            """);
}
