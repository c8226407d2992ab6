using ConsistencyHost.Sdk.Analyzers.Banned;
using Microsoft.CodeAnalysis.CSharp;
using Verify = ConsistencyHost.Sdk.Analyzers.Tests.Verify<ConsistencyHost.Sdk.Analyzers.Banned.BannedApiAnalyzer>;

namespace ConsistencyHost.Sdk.Analyzers.Tests.Banned;

public sealed class BannedApiAnalyzerTests
{
    [Fact]
    public Task Analyze_FileRead_ReportsBannedApiNamingTheMethodAndEntry() =>
        Verify.Analyzer(PluginSource.RuleWithBody("""var text = {|#0:System.IO.File.ReadAllText("/etc/hosts")|};"""),
            Verify.Diagnostic(Descriptors.BannedApi).WithLocation(0)
                .WithArguments("System.IO.File.ReadAllText(string)", "T:System.IO.File", "file-system: reads or writes files"));

    [Fact]
    public Task Analyze_HttpClientInSubNamespace_ReportsTheNamespaceBan() =>
        Verify.Analyzer(PluginSource.RuleWithBody("""using var client = {|#0:new System.Net.Http.HttpClient()|};"""),
            Verify.Diagnostic(Descriptors.BannedApi).WithLocation(0)
                .WithArguments("System.Net.Http.HttpClient.HttpClient()", "N:System.Net", "network: opens network connections"));

    [Fact]
    public Task Analyze_ProcessStartAndConsole_ReportsBoth() =>
        Verify.Analyzer(PluginSource.RuleWithBody("""
            {|#0:System.Diagnostics.Process.Start("ls")|};
            {|#1:Console.WriteLine("done")|};
            """),
            Verify.Diagnostic(Descriptors.BannedApi).WithLocation(0)
                .WithArguments("System.Diagnostics.Process.Start(string)", "T:System.Diagnostics.Process", "process: starts or inspects processes"),
            Verify.Diagnostic(Descriptors.BannedApi).WithLocation(1)
                .WithArguments("System.Console.WriteLine(string?)", "T:System.Console", "console: writes to the host's console; return findings instead"));

    [Fact]
    public Task Analyze_PInvokeDeclaration_ReportsInterop() =>
        Verify.Analyzer("""
            internal static class Native
            {
                [{|#0:System.Runtime.InteropServices.DllImport("libc")|}]
                internal static extern int getpid();
            }
            """,
            Verify.Diagnostic(Descriptors.BannedApi).WithLocation(0)
                .WithArguments("System.Runtime.InteropServices.DllImportAttribute", "T:System.Runtime.InteropServices.DllImportAttribute", "interop: calls native code (P/Invoke)"));

    [Fact]
    public Task Analyze_AllowUnsafeBlocks_ReportsUnsafeCodeForTheCompilation() =>
        Verify.Analyzer(PluginSource.RuleWithBody("var sum = 1 + 2;"),
            test => test.SolutionTransforms.Add((solution, project) =>
                solution.WithProjectCompilationOptions(project, ((CSharpCompilationOptions)solution.GetProject(project)!.CompilationOptions!).WithAllowUnsafe(true))),
            Verify.Diagnostic(Descriptors.BannedApi)
                .WithArguments("unsafe code (AllowUnsafeBlocks)", "T:System.Security.UnverifiableCodeAttribute",
                    "unsafe: unsafe code (pointers, fixed, stackalloc into pointers) is enabled"));

    [Fact]
    public Task Analyze_TypeFoundByNameAndBoundToADelegate_ReportsBothReflectionCalls() =>
        Verify.Analyzer(PluginSource.RuleWithBody("""
            var file = {|#0:typeof(object).Assembly.GetType("System.IO.File", true)|}!;
            var read = {|#1:file.GetMethod("ReadAllText", new[] { typeof(string) })!.CreateDelegate(typeof(Func<string, string>))|};
            """),
            Verify.Diagnostic(Descriptors.BannedApi).WithLocation(0)
                .WithArguments("System.Reflection.Assembly.GetType(string, bool)", "M:System.Reflection.Assembly.GetType(System.String,System.Boolean)",
                    "reflection: finds a type by name, hiding which API is used"),
            Verify.Diagnostic(Descriptors.BannedApi).WithLocation(1)
                .WithArguments("System.Reflection.MethodInfo.CreateDelegate(System.Type)", "M:System.Reflection.MethodInfo.CreateDelegate(System.Type)",
                    "reflection: binds a delegate to a method found at run time"));

    [Fact]
    public Task Analyze_ConstructorInvokedAndDelegateCreated_ReportsBoth() =>
        Verify.Analyzer(PluginSource.RuleWithBody("""
            var made = {|#0:typeof(System.Text.StringBuilder).GetConstructor(Type.EmptyTypes)!.Invoke(Array.Empty<object>())|};
            var bound = {|#1:Delegate.CreateDelegate(typeof(Func<string>), typeof(string).GetMethod("Empty")!)|};
            """),
            Verify.Diagnostic(Descriptors.BannedApi).WithLocation(0)
                .WithArguments("System.Reflection.ConstructorInfo.Invoke(object?[]?)", "M:System.Reflection.ConstructorInfo.Invoke(System.Object[])",
                    "reflection: calls a constructor found at run time"),
            Verify.Diagnostic(Descriptors.BannedApi).WithLocation(1)
                .WithArguments("System.Delegate.CreateDelegate(System.Type, System.Reflection.MethodInfo)", "M:System.Delegate.CreateDelegate(System.Type,System.Reflection.MethodInfo)",
                    "reflection: binds a delegate to a method found at run time"));

    [Fact]
    public Task Analyze_PureComputation_ReportsNothing() =>
        Verify.Analyzer(PluginSource.RuleWithBody("""
            var largest = Math.Max(entry.Spectra.Count, 1);
            var builder = new System.Text.StringBuilder().Append(largest);
            var sorted = entry.Spectra.OrderBy(s => s.FrequencyMHz).ToList();
            var path = System.IO.Path.Combine("a", "b");
            """));
}
