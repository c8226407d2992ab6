using BenchmarkDotNet.Attributes;
using ConsistencyHost.Engine.Profiles;

namespace ConsistencyHost.Benchmarks.Entries;

/// <summary>
/// Each built-in rule alone on the warm mix (perception and interpretation already computed, as they are for
/// every rule after the first in a real check): the rule's own share of an entry. Called directly, so the
/// runner's task, deadline and stamping overhead is not in these figures (it is in EntryBenchmarks.Check).
/// </summary>
[BenchmarkCategory("rule")]
public class RuleBenchmarks
{
    private EntryFixture _fixture = null!;
    private ActiveRule _rule = null!;

    /// <summary>The rule to time.</summary>
    [ParamsSource(nameof(RuleIds))]
    public string RuleId { get; set; } = "";

    /// <summary>Every rule of the default profile; read from the plugin folder so a new rule is timed too.</summary>
    public static IEnumerable<string> RuleIds() => EntryFixture.RuleIds();

    [GlobalSetup]
    public void Setup()
    {
        _fixture = EntryFixture.Create();
        _rule = _fixture.Engine.GetProfile(null).Rules.Single(r => r.Descriptor.Id == RuleId);
    }

    /// <summary>The rule's Check on every entry of the mix, findings enumerated.</summary>
    [Benchmark(OperationsPerInvoke = EntryMix.Count)]
    public int Rule()
    {
        var findings = 0;
        foreach (var entry in _fixture.Entries)
        {
            var instance = _rule.Descriptor.Factory!();
            foreach (var _ in instance.Check(entry, _rule.Options, CancellationToken.None)) findings++;
        }

        return findings;
    }
}
