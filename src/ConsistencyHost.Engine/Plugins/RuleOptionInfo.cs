namespace ConsistencyHost.Engine.Plugins;

/// <summary>One option a profile may set on a rule: its name, its type as the binder describes it, its default.</summary>
/// <param name="Name">The property name, as a profile names it.</param>
/// <param name="Type">"a value of type Double", "one of Warn, Fail".</param>
/// <param name="Default">The default value as invariant text.</param>
public sealed record RuleOptionInfo(string Name, string Type, string Default);

/// <summary>
/// A rule's options bound and validated under one profile by the worker that described the rule, so that the
/// host never creates (or validates) an untrusted plugin's options object itself.
/// </summary>
/// <param name="Problems">Every binding and validation problem, worded as the host's binder words them.</param>
/// <param name="Json">The bound options as JSON, sent back to the worker with every run; empty when invalid.</param>
/// <param name="Values">The bound values as invariant text by option name, for display.</param>
public sealed record BoundOptions(IReadOnlyList<string> Problems, string Json, IReadOnlyList<KeyValuePair<string, string>> Values);
