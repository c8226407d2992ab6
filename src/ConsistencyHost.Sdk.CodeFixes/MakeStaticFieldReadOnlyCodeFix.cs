using System.Collections.Immutable;
using System.Composition;
using System.Threading;
using System.Threading.Tasks;
using ConsistencyHost.Sdk.Analyzers;
using ConsistencyHost.Sdk.Analyzers.State;
using Microsoft.CodeAnalysis;
using Microsoft.CodeAnalysis.CodeActions;
using Microsoft.CodeAnalysis.CodeFixes;
using Microsoft.CodeAnalysis.CSharp;
using Microsoft.CodeAnalysis.CSharp.Syntax;

namespace ConsistencyHost.Sdk.CodeFixes;

/// <summary>
/// CHSDK2002 on a static field that is not readonly: adds <c>readonly</c>. Offered only for fields whose type
/// is not itself mutable (a readonly List is still shared mutable state, so there is no mechanical fix).
/// </summary>
[ExportCodeFixProvider(LanguageNames.CSharp, Name = nameof(MakeStaticFieldReadOnlyCodeFix)), Shared]
public sealed class MakeStaticFieldReadOnlyCodeFix : CodeFixProvider
{
    private const string Title = "Make the static field readonly";

    /// <inheritdoc />
    public override ImmutableArray<string> FixableDiagnosticIds { get; } = ImmutableArray.Create(Descriptors.MutableStaticState.Id);

    /// <inheritdoc />
    public override FixAllProvider GetFixAllProvider() => WellKnownFixAllProviders.BatchFixer;

    /// <inheritdoc />
    public override async Task RegisterCodeFixesAsync(CodeFixContext context)
    {
        var root = await context.Document.GetSyntaxRootAsync(context.CancellationToken).ConfigureAwait(false);
        foreach (var diagnostic in context.Diagnostics)
        {
            var node = root?.FindNode(diagnostic.Location.SourceSpan);
            if (diagnostic.Properties.ContainsKey(MutableStaticStateAnalyzer.AddReadOnlyProperty) &&
                node?.FirstAncestorOrSelf<FieldDeclarationSyntax>() is { } field && !field.Modifiers.Any(SyntaxKind.ReadOnlyKeyword))
            {
                context.RegisterCodeFix(
                    CodeAction.Create(Title, ct => AddReadOnly(context.Document, field, ct), equivalenceKey: Title),
                    diagnostic);
            }
        }
    }

    private static async Task<Document> AddReadOnly(Document document, FieldDeclarationSyntax field, CancellationToken cancellationToken)
    {
        var root = await document.GetSyntaxRootAsync(cancellationToken).ConfigureAwait(false);
        var readOnly = SyntaxFactory.Token(SyntaxKind.ReadOnlyKeyword).WithTrailingTrivia(SyntaxFactory.Space);
        var updated = field.WithModifiers(field.Modifiers.Add(readOnly));
        return document.WithSyntaxRoot(root!.ReplaceNode(field, updated));
    }
}
