namespace ConsistencyHost.Engine.Vetting;

/// <summary>
/// One reason to refuse a plugin: the diagnostic id the SDK analyzers use for the same problem, the API or
/// state involved, the banned-list entry or rule behind it, and the member of the plugin where it was found.
/// </summary>
/// <param name="Code">The matching analyzer diagnostic id (CHSDK1001, CHSDK2001, CHSDK2002, …) or a compiler error id.</param>
/// <param name="Api">What the plugin uses, e.g. <c>System.DateTime.Now</c> or a static field's name.</param>
/// <param name="Because">Why it is refused, e.g. "banned by P:System.DateTime.Now (nondeterminism: reads the wall clock)".</param>
/// <param name="Member">The plugin member that uses it, e.g. <c>Lab.ClockRule.Check</c>; null when not known.</param>
public sealed record VettingProblem(string Code, string Api, string Because, string? Member)
{
    /// <summary>One line for a refusal message.</summary>
    public override string ToString() =>
        Member is null ? $"{Code}: {Api}, {Because}" : $"{Code}: {Member} uses {Api}, {Because}";
}
