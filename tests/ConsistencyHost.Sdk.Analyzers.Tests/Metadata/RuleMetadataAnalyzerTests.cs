using Verify = ConsistencyHost.Sdk.Analyzers.Tests.Verify<ConsistencyHost.Sdk.Analyzers.Metadata.RuleMetadataAnalyzer>;

namespace ConsistencyHost.Sdk.Analyzers.Tests.Metadata;

public sealed class RuleMetadataAnalyzerTests
{
    private const string Body = """
        {
            protected override IEnumerable<Finding> Check(IEntryView entry, NoOptions options, CancellationToken cancellationToken) => [];
        }
        """;

    [Fact]
    public Task Analyze_RuleWithoutAttribute_ReportsMissingMetadata() =>
        Verify.Analyzer("public sealed class {|#0:Unlabelled|} : Rule<NoOptions>\n" + Body,
            Verify.Diagnostic(Descriptors.MissingMetadata).WithLocation(0).WithArguments("Unlabelled"));

    [Fact]
    public Task Analyze_IdWithCapitalsAndShortVersion_ReportsEachProblem() =>
        Verify.Analyzer("""[{|#0:Rule("Couplings_Listed", "1.0", "Couplings are listed")|}]""" + "\npublic sealed class Bad : Rule<NoOptions>\n" + Body,
            Verify.Diagnostic(Descriptors.MalformedMetadata).WithLocation(0)
                .WithArguments("Bad", "rule id 'Couplings_Listed' must be lower-case words joined by hyphens, e.g. 'signal-count'"),
            Verify.Diagnostic(Descriptors.MalformedMetadata).WithLocation(0)
                .WithArguments("Bad", "rule version '1.0' must be 'major.minor.patch', e.g. '1.0.0'"));

    [Fact]
    public Task Analyze_BlankTitle_ReportsMalformedMetadata() =>
        Verify.Analyzer("""[{|#0:Rule("lab-rule", "1.0.0", "  ")|}]""" + "\npublic sealed class Untitled : Rule<NoOptions>\n" + Body,
            Verify.Diagnostic(Descriptors.MalformedMetadata).WithLocation(0).WithArguments("Untitled", "rule title must not be empty"));

    [Fact]
    public Task Analyze_TwoRulesWithOneId_ReportsTheSecond() =>
        Verify.Analyzer(
            """[Rule("lab-rule", "1.0.0", "First")]""" + "\npublic sealed class First : Rule<NoOptions>\n" + Body +
            """[Rule("lab-rule", "1.0.0", "Second")]""" + "\npublic sealed class {|#0:Second|} : Rule<NoOptions>\n" + Body,
            Verify.Diagnostic(Descriptors.DuplicateRuleId).WithLocation(0).WithArguments("lab-rule", "Second", "First"));

    [Fact]
    public Task Analyze_WellFormedRulesAndAbstractBase_ReportNothing() =>
        Verify.Analyzer(
            "public abstract class LabRuleBase : Rule<NoOptions> { }\n" +
            """[Rule("lindqvist-couplings-listed", "2.10.0", "Couplings are listed", Nuclei = ["1H"])]""" +
            "\npublic sealed class Listed : Rule<NoOptions>\n" + Body);
}
