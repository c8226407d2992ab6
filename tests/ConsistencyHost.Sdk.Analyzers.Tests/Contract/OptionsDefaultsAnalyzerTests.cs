using Verify = ConsistencyHost.Sdk.Analyzers.Tests.Verify<ConsistencyHost.Sdk.Analyzers.Contract.OptionsDefaultsAnalyzer>;

namespace ConsistencyHost.Sdk.Analyzers.Tests.Contract;

public sealed class OptionsDefaultsAnalyzerTests
{
    [Fact]
    public Task Analyze_NonNullableStringWithoutInitialiser_ReportsMissingDefault() =>
        Verify.Analyzer("""
            #nullable enable
            public sealed record LabOptions : RuleOptions
            {
                public string {|#0:Solvent|} { get; init; }
            }
            """,
            Verify.Diagnostic(Descriptors.OptionsDefault).WithLocation(0).WithArguments("Solvent", "string"));

    [Fact]
    public Task Analyze_InitialisedNullableValueAndComputed_ReportNothing() =>
        Verify.Analyzer("""
            #nullable enable
            public sealed record LabOptions : RuleOptions
            {
                public string Solvent { get; init; } = "CDCl3";
                public string? Instrument { get; init; }
                public double ToleranceHz { get; init; }
                public string Label => Solvent + ToleranceHz;
            }
            """);
}
