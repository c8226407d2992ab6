using Basic.Reference.Assemblies;
using ConsistencyHost.Sdk.Rules;
using Microsoft.CodeAnalysis;
using Microsoft.CodeAnalysis.CodeFixes;
using Microsoft.CodeAnalysis.CSharp;
using Microsoft.CodeAnalysis.CSharp.Testing;
using Microsoft.CodeAnalysis.Diagnostics;
using Microsoft.CodeAnalysis.Testing;

namespace ConsistencyHost.Sdk.Analyzers.Tests;

/// <summary>
/// Runs one analyzer through Microsoft.CodeAnalysis.Testing on plugin-shaped source compiled against the
/// .NET 10 reference assemblies and the SDK, as a plugin project is.
/// </summary>
internal static class Verify<TAnalyzer>
    where TAnalyzer : DiagnosticAnalyzer, new()
{
    /// <summary>Usings every test source starts with (a plugin project has them as implicit usings).</summary>
    public const string Usings = """
        using System;
        using System.Collections.Generic;
        using System.Linq;
        using System.Threading;
        using ConsistencyHost.Sdk.Entries;
        using ConsistencyHost.Sdk.Findings;
        using ConsistencyHost.Sdk.Options;
        using ConsistencyHost.Sdk.Rules;

        """;

    public static DiagnosticResult Diagnostic(DiagnosticDescriptor descriptor) => new(descriptor);

    public static Task Analyzer(string source, params DiagnosticResult[] expected) => Analyzer(source, _ => { }, expected);

    public static Task Analyzer(string source, Action<CSharpAnalyzerTest<TAnalyzer, DefaultVerifier>> adjust, params DiagnosticResult[] expected)
    {
        var test = new CSharpAnalyzerTest<TAnalyzer, DefaultVerifier> { TestCode = Usings + source };
        Configure(test);
        adjust(test);
        test.ExpectedDiagnostics.AddRange(expected);
        return test.RunAsync();
    }

    public static Task CodeFix<TFix>(string source, string fixedSource, params DiagnosticResult[] expected)
        where TFix : CodeFixProvider, new()
    {
        var test = new CSharpCodeFixTest<TAnalyzer, TFix, DefaultVerifier>
        {
            TestCode = Usings + source,
            FixedCode = Usings + fixedSource,
        };
        Configure(test);
        test.ExpectedDiagnostics.AddRange(expected);
        return test.RunAsync();
    }

    private static void Configure<TVerifier>(AnalyzerTest<TVerifier> test)
        where TVerifier : IVerifier, new()
    {
        // No package download: the reference set comes from Basic.Reference.Assemblies plus the SDK's own assemblies.
        test.ReferenceAssemblies = new ReferenceAssemblies("net10.0");
        test.TestState.AdditionalReferences.AddRange(Net100.References.All);
        test.TestState.AdditionalReferences.Add(MetadataReference.CreateFromFile(typeof(IRule).Assembly.Location));
        test.TestState.AdditionalReferences.Add(MetadataReference.CreateFromFile(typeof(Spectra.Model.Spectrum).Assembly.Location));
        // The banned-API and metadata analyzers analyse generated code on purpose (a generator must not hide a
        // banned call), so the framework's "no diagnostics in generated code" re-run does not apply.
        test.TestBehaviors |= TestBehaviors.SkipGeneratedCodeCheck;
        // The framework compiles with unsafe code allowed; a plugin project does not.
        test.SolutionTransforms.Add((solution, project) => solution.WithProjectCompilationOptions(project,
            ((CSharpCompilationOptions)solution.GetProject(project)!.CompilationOptions!).WithAllowUnsafe(false)));
    }
}
