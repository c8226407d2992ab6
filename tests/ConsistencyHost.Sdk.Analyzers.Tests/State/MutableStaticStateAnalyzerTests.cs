using ConsistencyHost.Sdk.CodeFixes;
using Verify = ConsistencyHost.Sdk.Analyzers.Tests.Verify<ConsistencyHost.Sdk.Analyzers.State.MutableStaticStateAnalyzer>;

namespace ConsistencyHost.Sdk.Analyzers.Tests.State;

public sealed class MutableStaticStateAnalyzerTests
{
    [Fact]
    public Task Analyze_StaticFieldNotReadonly_ReportsMutableState() =>
        Verify.Analyzer("internal static class Counter { internal static int {|#0:Runs|}; }",
            Verify.Diagnostic(Descriptors.MutableStaticState).WithLocation(0).WithArguments("Counter.Runs", "a static field that is not readonly"));

    [Fact]
    public Task Analyze_ReadonlyStaticListAndArray_ReportsMutableCollections() =>
        Verify.Analyzer("""
            internal static class Cache
            {
                internal static readonly List<double> {|#0:Seen|} = new();
                internal static readonly string[] {|#1:Labels|} = ["s", "d"];
            }
            """,
            Verify.Diagnostic(Descriptors.MutableStaticState).WithLocation(0)
                .WithArguments("Cache.Seen", "a static of the mutable type 'System.Collections.Generic.List<double>'; use an immutable or frozen collection"),
            Verify.Diagnostic(Descriptors.MutableStaticState).WithLocation(1)
                .WithArguments("Cache.Labels", "a static of the mutable type 'string[]'; use an immutable or frozen collection"));

    [Fact]
    public Task Analyze_StaticAutoPropertyWithSetter_ReportsMutableState() =>
        Verify.Analyzer("internal static class Settings { internal static double {|#0:Tolerance|} { get; set; } = 0.5; }",
            Verify.Diagnostic(Descriptors.MutableStaticState).WithLocation(0).WithArguments("Settings.Tolerance", "a static auto-property with a setter"));

    [Fact]
    public Task Analyze_ConstantsReadonlyValuesAndReadOnlyInterfaces_ReportNothing() =>
        Verify.Analyzer("""
            internal static class Tables
            {
                internal const string Code = "couplings-missing";
                internal static readonly double Tolerance = 0.3;
                internal static readonly IReadOnlyList<string> Multiplets = ["d", "t", "q"];
                internal static IReadOnlyDictionary<string, int> Lines { get; } = new Dictionary<string, int> { ["d"] = 1 };
                internal static string Describe => Code;
            }
            """);

    [Fact]
    public Task Fix_StaticFieldNotReadonly_AddsReadonly() =>
        Verify.CodeFix<MakeStaticFieldReadOnlyCodeFix>(
            "internal static class Limits { internal static double {|#0:Tolerance|} = 0.3; }",
            "internal static class Limits { internal static readonly double Tolerance = 0.3; }",
            Verify.Diagnostic(Descriptors.MutableStaticState).WithLocation(0).WithArguments("Limits.Tolerance", "a static field that is not readonly"));

    [Fact]
    public Task Fix_ReadonlyListField_OffersNothingBecauseReadonlyIsNoCure() =>
        Verify.CodeFix<MakeStaticFieldReadOnlyCodeFix>(
            "internal static class Cache { internal static readonly List<double> {|#0:Seen|} = new(); }",
            "internal static class Cache { internal static readonly List<double> {|#0:Seen|} = new(); }",
            Verify.Diagnostic(Descriptors.MutableStaticState).WithLocation(0)
                .WithArguments("Cache.Seen", "a static of the mutable type 'System.Collections.Generic.List<double>'; use an immutable or frozen collection"));

    [Fact]
    public Task Fix_MutableListFieldNotReadonly_OffersNothing() =>
        Verify.CodeFix<MakeStaticFieldReadOnlyCodeFix>(
            "internal static class Cache { internal static List<double> {|#0:Seen|} = new(); }",
            "internal static class Cache { internal static List<double> {|#0:Seen|} = new(); }",
            Verify.Diagnostic(Descriptors.MutableStaticState).WithLocation(0).WithArguments("Cache.Seen", "a static field that is not readonly"));
}
