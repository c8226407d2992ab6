using Basic.Reference.Assemblies;
using ConsistencyHost.Sdk.Rules;
using ConsistencyHost.Spectra.Model;
using Microsoft.CodeAnalysis;
using Microsoft.CodeAnalysis.CSharp;

namespace ConsistencyHost.Engine.Vetting;

/// <summary>
/// What a source plugin is compiled against, chosen by the host and not by the author: the .NET 10 reference
/// assemblies (carried by the host, so no SDK install is needed) and the host's own SDK and spectrum model.
/// </summary>
internal static class SourcePluginReferences
{
    public static IReadOnlyList<MetadataReference> All { get; } =
    [
        .. Net100.References.All,
        MetadataReference.CreateFromFile(typeof(IRule).Assembly.Location),
        MetadataReference.CreateFromFile(typeof(Spectrum).Assembly.Location),
    ];

    /// <summary>
    /// The implicit usings of a plugin project (Microsoft.NET.Sdk's, less System.IO and System.Net.Http,
    /// which a plugin may not use) plus the SDK's namespaces, so a source plugin reads like a project's file.
    /// </summary>
    public static SyntaxTree GlobalUsings(CSharpParseOptions options) => CSharpSyntaxTree.ParseText("""
        global using System;
        global using System.Collections.Generic;
        global using System.Linq;
        global using System.Threading;
        global using System.Threading.Tasks;
        global using ConsistencyHost.Sdk.Entries;
        global using ConsistencyHost.Sdk.Findings;
        global using ConsistencyHost.Sdk.Options;
        global using ConsistencyHost.Sdk.Rules;
        global using ConsistencyHost.Spectra.Model;
        """, options, path: "GlobalUsings.g.cs");

    public static CSharpCompilationOptions Options { get; } = new(
        OutputKind.DynamicallyLinkedLibrary,
        optimizationLevel: OptimizationLevel.Release,
        allowUnsafe: false,
        deterministic: true,
        nullableContextOptions: NullableContextOptions.Enable);

    public static CSharpParseOptions ParseOptions { get; } = new(LanguageVersion.Latest);
}
