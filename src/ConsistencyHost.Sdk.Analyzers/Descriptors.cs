using Microsoft.CodeAnalysis;

namespace ConsistencyHost.Sdk.Analyzers;

/// <summary>
/// Every diagnostic the SDK analyzers report. Ranges: CHSDK0xxx rule metadata, CHSDK1xxx reach (banned APIs, the allow-list),
/// CHSDK2xxx determinism and shared state, CHSDK3xxx use of the SDK contract.
/// </summary>
public static class Descriptors
{
    private const string HelpRoot = "docs/analyzers/";

    /// <summary>A class implementing IRule has no [Rule] attribute.</summary>
    public static readonly DiagnosticDescriptor MissingMetadata = Create("CHSDK0001", "Metadata", DiagnosticSeverity.Error,
        "Rule class has no [Rule] metadata",
        "Rule class '{0}' implements IRule but has no [Rule(id, version, title)] attribute; the host refuses it");

    /// <summary>The [Rule] attribute's id, version or title is malformed.</summary>
    public static readonly DiagnosticDescriptor MalformedMetadata = Create("CHSDK0002", "Metadata", DiagnosticSeverity.Error,
        "Rule metadata is malformed",
        "Rule class '{0}': {1}");

    /// <summary>Two rule classes in one assembly share an id.</summary>
    public static readonly DiagnosticDescriptor DuplicateRuleId = Create("CHSDK0003", "Metadata", DiagnosticSeverity.Error,
        "Rule id is used twice",
        "Rule id '{0}' of '{1}' is also used by '{2}'; the host refuses the second",
        WellKnownDiagnosticTags.CompilationEnd);

    /// <summary>A plugin uses an API from the banned list.</summary>
    public static readonly DiagnosticDescriptor BannedApi = Create("CHSDK1001", "Reach", DiagnosticSeverity.Error,
        "Banned API used in a rule plugin",
        "'{0}' is banned in rule plugins by {1} ({2})");

    /// <summary>A plugin references an API that is not on the allow-list.</summary>
    public static readonly DiagnosticDescriptor NotAllowed = Create("CHSDK1002", "Reach", DiagnosticSeverity.Error,
        "API not on the allow-list used in a rule plugin",
        "'{0}' is not on the allow-list of APIs a rule plugin may use (AllowedApis.txt)");

    /// <summary>A plugin uses a nondeterministic API from the banned list.</summary>
    public static readonly DiagnosticDescriptor Nondeterminism = Create("CHSDK2001", "Determinism", DiagnosticSeverity.Error,
        "Nondeterministic API used in a rule plugin",
        "'{0}' makes the rule's findings differ between runs, banned by {1} ({2})");

    /// <summary>A plugin keeps mutable state in a static field or property.</summary>
    public static readonly DiagnosticDescriptor MutableStaticState = Create("CHSDK2002", "Determinism", DiagnosticSeverity.Error,
        "Mutable static state in a rule plugin",
        "'{0}' is mutable static state ({1}); rules run concurrently and must not share state between runs");

    /// <summary>A rule's Check never looks at its cancellation token.</summary>
    public static readonly DiagnosticDescriptor CancellationIgnored = Create("CHSDK3001", "Contract", DiagnosticSeverity.Warning,
        "Check ignores its cancellation token",
        "'{0}' never uses its CancellationToken parameter '{1}'; the host cancels a rule at its deadline");

    /// <summary>A finding's code is empty or not a constant.</summary>
    public static readonly DiagnosticDescriptor FindingCode = Create("CHSDK3002", "Contract", DiagnosticSeverity.Warning,
        "Finding code is empty or not a constant",
        "The finding code {0}; declare it as a non-empty constant in the rule's Codes class");

    /// <summary>A finding's message is empty.</summary>
    public static readonly DiagnosticDescriptor FindingMessage = Create("CHSDK3003", "Contract", DiagnosticSeverity.Warning,
        "Finding message is empty",
        "The finding message is empty; say what is wrong in a sentence a chemist understands");

    /// <summary>An options property of a non-nullable reference type has no default.</summary>
    public static readonly DiagnosticDescriptor OptionsDefault = Create("CHSDK3004", "Contract", DiagnosticSeverity.Warning,
        "Options property has no default",
        "Option '{0}' of type '{1}' is not nullable but has no initialiser, so its default is null; give it a documented default or make it nullable");

    private static DiagnosticDescriptor Create(string id, string category, DiagnosticSeverity severity, string title,
        string message, params string[] tags) =>
        new(id, title, message, category, severity, isEnabledByDefault: true,
            description: title + ".", helpLinkUri: HelpRoot + id + ".md", customTags: tags);
}
