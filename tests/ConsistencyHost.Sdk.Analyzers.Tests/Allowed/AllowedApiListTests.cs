using Basic.Reference.Assemblies;
using ConsistencyHost.Sdk.Analyzers.Allowed;
using ConsistencyHost.Sdk.Analyzers.Banned;
using ConsistencyHost.Sdk.Rules;
using Microsoft.CodeAnalysis;
using Microsoft.CodeAnalysis.CSharp;

namespace ConsistencyHost.Sdk.Analyzers.Tests.Allowed;

public sealed class AllowedApiListTests
{
    [Fact]
    public void Embedded_SdkAndAnalyzerCopies_AreTheSameText()
    {
        var sdk = ApiListResource.Read(typeof(IRule).Assembly, AllowedApiList.ResourceName);
        var analyzer = ApiListResource.Read(typeof(AllowedApiList).Assembly, AllowedApiList.ResourceName);

        Assert.NotEmpty(sdk);
        Assert.Equal(sdk, analyzer);
    }

    [Fact]
    public void Embedded_EveryEntry_ResolvesInTheNet10ReferenceAssembliesOrTheSdk()
    {
        // Outside reference: the .NET 10 reference assemblies. A misspelt id would silently allow nothing.
        var compilation = CSharpCompilation.Create("probe", references:
        [
            .. Net100.References.All,
            MetadataReference.CreateFromFile(typeof(IRule).Assembly.Location),
            MetadataReference.CreateFromFile(typeof(Spectra.Model.Spectrum).Assembly.Location),
            MetadataReference.CreateFromFile(typeof(Chemistry.Model.Molecule).Assembly.Location),
        ]);
        var unresolved = AllowedApiList.Embedded.DocumentationIds
            .Where(id => id[0] == 'N'
                ? ReferenceNamespaces.Find(compilation, id[2..]) is null
                : DocumentationCommentId.GetSymbolsForDeclarationId(id, compilation).IsEmpty)
            .ToList();

        Assert.Empty(unresolved);
    }

    [Fact]
    public void Embedded_NothingIsBothAllowedAndBannedAsAWhole()
    {
        // A banned entry inside an allowed type (DateTime.Now) is how the two lists work together; the same id on
        // both would be a contradiction the reader of the lists could not resolve.
        var banned = BannedApiList.Embedded.Entries.Select(e => e.DocumentationId).ToHashSet(StringComparer.Ordinal);

        Assert.DoesNotContain(AllowedApiList.Embedded.DocumentationIds, banned.Contains);
    }

    [Theory]
    [InlineData("N:System.Runtime.InteropServices")]
    [InlineData("N:System.Reflection")]
    [InlineData("N:System.IO")]
    [InlineData("N:System.Threading.Tasks")]
    [InlineData("T:System.AppContext")]
    [InlineData("T:System.Runtime.InteropServices.MemoryMarshal")]
    [InlineData("T:System.Type")]
    public void Embedded_DangerousNamespacesAndTypes_AreNotListedWhole(string id) =>
        Assert.DoesNotContain(id, AllowedApiList.Embedded.DocumentationIds);

    [Fact]
    public void Parse_BadIdAndDuplicate_ReportsEveryProblemWithItsLine()
    {
        var error = Assert.Throws<FormatException>(() => AllowedApiList.Parse("// comment\nSystem.Math\nT:System.Math\nT:System.Math\n"));

        Assert.Equal(AllowedApiList.Malformed + BannedApiListMessages.NotADocumentationId(2, "System.Math") + "; " +
                     BannedApiListMessages.Duplicate(4, "T:System.Math"), error.Message);
    }
}
