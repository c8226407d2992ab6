using Verify = ConsistencyHost.Sdk.Analyzers.Tests.Verify<ConsistencyHost.Sdk.Analyzers.Contract.FindingArgumentsAnalyzer>;

namespace ConsistencyHost.Sdk.Analyzers.Tests.Contract;

public sealed class FindingArgumentsAnalyzerTests
{
    [Fact]
    public Task Analyze_EmptyCode_ReportsFindingCode() =>
        Verify.Analyzer(PluginSource.RuleWithBody("""yield return new Finding({|#0:""|}, Severity.Warning, "The 1H list has no solvent.");"""),
            Verify.Diagnostic(Descriptors.FindingCode).WithLocation(0).WithArguments("is empty"));

    [Fact]
    public Task Analyze_CodeBuiltAtRunTime_ReportsFindingCode() =>
        Verify.Analyzer(PluginSource.RuleWithBody("""
            var code = "spectrum-" + entry.Spectra.Count;
            yield return new Finding({|#0:code|}, Severity.Warning, "Too many spectra.");
            """),
            Verify.Diagnostic(Descriptors.FindingCode).WithLocation(0).WithArguments("'code' is not a constant"));

    [Fact]
    public Task Analyze_BlankMessage_ReportsFindingMessage() =>
        Verify.Analyzer(PluginSource.RuleWithBody("""yield return new Finding("couplings-missing", Severity.Warning, {|#0:" "|});"""),
            Verify.Diagnostic(Descriptors.FindingMessage).WithLocation(0));

    [Fact]
    public Task Analyze_ConstantCodeAndComposedMessage_ReportsNothing() =>
        Verify.Analyzer(PluginSource.RuleWithBody("""
            const string code = "couplings-missing";
            yield return new Finding(code, Severity.Warning, $"Signal {entry.Spectra.Count} lists no J values.");
            """));
}
