namespace ConsistencyHost.Sdk.Analyzers.Tests;

/// <summary>Plugin-shaped source for the analyzer tests: a well-formed rule whose Check runs the given statements.</summary>
internal static class PluginSource
{
    public static string RuleWithBody(string statements) => $$"""
        [Rule("lab-rule", "1.0.0", "A lab rule")]
        public sealed class LabRule : Rule<NoOptions>
        {
            protected override IEnumerable<Finding> Check(IEntryView entry, NoOptions options, CancellationToken cancellationToken)
            {
                cancellationToken.ThrowIfCancellationRequested();
                {{statements}}
                yield break;
            }
        }
        """;
}
