using Basic.Reference.Assemblies;
using ConsistencyHost.Sdk.Analyzers.Banned;
using ConsistencyHost.Sdk.Rules;
using Microsoft.CodeAnalysis;
using Microsoft.CodeAnalysis.CSharp;

namespace ConsistencyHost.Sdk.Analyzers.Tests.Banned;

public sealed class BannedApiListTests
{
    [Fact]
    public void Embedded_SdkAndAnalyzerCopies_AreTheSameBytes()
    {
        var sdk = Read(typeof(IRule).Assembly);
        var analyzer = Read(typeof(BannedApiList).Assembly);

        Assert.NotEmpty(sdk);
        Assert.Equal(sdk, analyzer);
    }

    [Fact]
    public void Embedded_EveryEntry_ResolvesInTheNet10ReferenceAssemblies()
    {
        // Outside reference: the .NET 10 reference assemblies. A misspelt id would silently ban nothing.
        var compilation = CSharpCompilation.Create("probe", references: Net100.References.All);
        var unresolved = BannedApiList.Embedded.Entries
            .Where(entry => entry.Kind == 'N'
                ? ReferenceNamespaces.Find(compilation, entry.Name) is null
                : DocumentationCommentId.GetSymbolsForDeclarationId(entry.DocumentationId, compilation).IsEmpty)
            .Select(entry => entry.DocumentationId)
            .ToList();

        Assert.Empty(unresolved);
        Assert.True(BannedApiList.Embedded.Entries.Count >= 60);
    }

    [Fact]
    public void Parse_LineWithoutCategory_NamesTheLineAndTheExpectedFormat()
    {
        var error = Assert.Throws<FormatException>(() => BannedApiList.Parse("// comment\nT:System.IO.File;reads files\n"));

        Assert.Equal(BannedApiListMessages.Malformed + BannedApiListMessages.ExpectedFormat(2, "T:System.IO.File;reads files"), error.Message);
    }

    [Fact]
    public void Parse_UnknownCategoryAndDuplicate_ReportsEveryProblem()
    {
        var text = "T:System.IO.File;disk: reads files\nM:System.Guid.NewGuid;nondeterminism: new id\nM:System.Guid.NewGuid;nondeterminism: again\n";

        var error = Assert.Throws<FormatException>(() => BannedApiList.Parse(text));

        Assert.Equal(BannedApiListMessages.Malformed +
                     BannedApiListMessages.BadCategoryOrReason(1, BannedApiList.Categories, "disk", "reads files") + "; " +
                     BannedApiListMessages.Duplicate(3, "M:System.Guid.NewGuid"), error.Message);
    }

    [Fact]
    public void Parse_IdWithoutKindPrefix_NamesTheLineAndTheExpectedPrefixes()
    {
        var error = Assert.Throws<FormatException>(() => BannedApiList.Parse("System.IO.File;file-system: reads files"));

        Assert.Equal(BannedApiListMessages.Malformed + BannedApiListMessages.NotADocumentationId(1, "System.IO.File"), error.Message);
    }

    [Fact]
    public void Parse_WellFormedLine_KeepsIdCategoryAndReason()
    {
        var entry = Assert.Single(BannedApiList.Parse("P:System.DateTime.Now;nondeterminism: reads the wall clock").Entries);

        Assert.Equal('P', entry.Kind);
        Assert.Equal("System.DateTime.Now", entry.Name);
        Assert.True(entry.IsNondeterminism);
        Assert.Equal("nondeterminism: reads the wall clock", entry.Explanation);
    }

    private static byte[] Read(System.Reflection.Assembly assembly)
    {
        using var stream = assembly.GetManifestResourceStream(BannedApiList.ResourceName)!;
        using var copy = new MemoryStream();
        stream.CopyTo(copy);
        return copy.ToArray();
    }
}
