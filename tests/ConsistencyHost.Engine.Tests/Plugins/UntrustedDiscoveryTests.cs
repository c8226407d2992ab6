using System.Runtime.Loader;
using ConsistencyHost.Engine.Intake;
using ConsistencyHost.Engine.Plugins;
using ConsistencyHost.Engine.Profiles;
using ConsistencyHost.Engine.Running;
using ConsistencyHost.Engine.Tests.Vetting;
using ConsistencyHost.Tests.Shared;

namespace ConsistencyHost.Engine.Tests.Plugins;

/// <summary>
/// With an executor, discovery vets an untrusted plugin through its metadata and hands it to the executor to
/// describe; nothing of it is loaded into this process. (The real worker executor is tested with the real host in
/// ConsistencyHost.Server.Tests/Isolation; here a recording executor stands in so the load contexts can be inspected.)
/// </summary>
public sealed class UntrustedDiscoveryTests
{
    private const string RuleSource = """
        namespace Lab;
        [Rule("lab-probe", "1.0.0", "Probe")]
        public sealed class ProbeRule : Rule<NoOptions>
        {
            protected override IEnumerable<Finding> Check(IEntryView entry, NoOptions options, CancellationToken cancellationToken)
            {
                cancellationToken.ThrowIfCancellationRequested();
                yield break;
            }
        }
        """;

    [Fact]
    public void Discover_UntrustedPluginWithExecutor_IsDescribedByTheExecutorAndNeverLoadedHere()
    {
        var name = "Lab.Untrusted" + Guid.NewGuid().ToString("N");
        using var folder = PluginFolder.With();
        VettingCorpus.DropCompiled(folder.Path, name, VettingCorpus.EmitSource(name, RuleSource));
        var executor = new RecordingExecutor();
        var profiles = new[] { new Profile { Name = Profile.DefaultName } };

        var rule = Assert.Single(PluginDiscovery.Discover(folder.Path, untrusted: new UntrustedPlugins(_ => false, executor, profiles)));

        Assert.Equal(("described-" + name + ".dll", name + ".dll"), (rule.Id, rule.Plugin));
        var described = Assert.Single(executor.Described);
        Assert.Equal(Path.Combine(folder.Path, name, name + ".dll"), described.AssemblyPath);
        Assert.Same(profiles, described.Profiles);
        Assert.DoesNotContain(AssemblyLoadContext.All, context => context.Name == name);
        Assert.DoesNotContain(AssemblyLoadContext.All.SelectMany(c => c.Assemblies), assembly => assembly.GetName().Name == name);
    }

    [Fact]
    public void Discover_TrustedPluginWithExecutor_LoadsHereAndIsNotDescribed()
    {
        var name = "Lab.Trusted" + Guid.NewGuid().ToString("N");
        using var folder = PluginFolder.With();
        VettingCorpus.DropCompiled(folder.Path, name, VettingCorpus.EmitSource(name, RuleSource));
        var executor = new RecordingExecutor();

        var rule = Assert.Single(PluginDiscovery.Discover(folder.Path, untrusted: new UntrustedPlugins(plugin => plugin == name, executor, [])));

        Assert.True(rule.IsLoaded, rule.LoadMessage);
        Assert.Equal("lab-probe", rule.Id);
        Assert.NotNull(rule.Factory);
        Assert.Empty(executor.Described);
        Assert.Contains(AssemblyLoadContext.All, context => context.Name == name);
    }

    [Fact]
    public void Discover_UntrustedPluginRefusedByVetting_NeverReachesTheExecutor()
    {
        using var folder = PluginFolder.With();
        VettingCorpus.DropCompiled(folder.Path, "Vetting.ReadsClock", VettingCorpus.Emit(VettingCorpus.Compile("Vetting.ReadsClock")));
        var executor = new RecordingExecutor();

        var rule = Assert.Single(PluginDiscovery.Discover(folder.Path, untrusted: new UntrustedPlugins(_ => false, executor, [])));

        Assert.StartsWith("refused by vetting of Vetting.ReadsClock.dll: CHSDK2001", rule.LoadMessage);
        Assert.Empty(executor.Described);
    }

    [Fact]
    public void Discover_ExecutorThatCannotIsolate_RefusesUntrustedCompiledAndSourcePluginsWithItsReasonAndLoadsTrustedOnes()
    {
        var trusted = "Lab.Trusted" + Guid.NewGuid().ToString("N");
        var untrusted = "Lab.Untrusted" + Guid.NewGuid().ToString("N");
        using var folder = PluginFolder.With();
        VettingCorpus.DropCompiled(folder.Path, trusted, VettingCorpus.EmitSource(trusted, RuleSource));
        VettingCorpus.DropCompiled(folder.Path, untrusted, VettingCorpus.EmitSource(untrusted, RuleSource));
        PluginFolder.WriteFile(Path.Combine(folder.Path, "Lab.Source", "ProbeRule.cs"), RuleSource);
        var executor = new RecordingExecutor { UnavailableReason = "worker isolation needs the host to run as root" };
        var cache = Path.Combine(folder.Path, "..", "ch-source-cache-" + Guid.NewGuid().ToString("N"));

        var rules = PluginDiscovery.Discover(folder.Path, cache, new UntrustedPlugins(plugin => plugin == trusted, executor, [])).ToDictionary(r => r.Plugin);

        Assert.True(rules[trusted + ".dll"].IsLoaded, rules[trusted + ".dll"].LoadMessage);
        foreach (var refused in new[] { rules[untrusted + ".dll"], rules["Lab.Source (source)"] })
        {
            Assert.False(refused.IsLoaded);
            Assert.Equal("untrusted plugins run only in isolated workers, and this host cannot start them: "
                + "worker isolation needs the host to run as root; the plugin was not run", refused.LoadMessage);
        }

        // Neither described by a worker nor compiled: nothing of the untrusted plugins ran anywhere.
        Assert.Empty(executor.Described);
        Assert.False(Directory.Exists(cache));
        Assert.DoesNotContain(AssemblyLoadContext.All, context => context.Name == untrusted);
    }

    [Fact]
    public void ResolveAll_WorkerBoundOptionsWithProblems_AreStartUpErrorsPrefixedLikeTheHostsOwn()
    {
        var bound = new Dictionary<string, BoundOptions>
        {
            [Profile.DefaultName] = new([], "{}", []),
            ["strict"] = new(["option 'Limit' expects a value of type Int32 but got 'many'"], "", []),
        };
        var rule = new RuleDescriptor { Id = "lab-probe", Version = "1.0.0", Plugin = "Lab.dll", WorkerBindings = bound };
        var options = new EngineOptions { PluginsPath = "unused", Profiles = [new Profile { Name = "strict" }] };

        var error = Assert.Throws<ProfileConfigurationException>(() => ProfileResolver.ResolveAll(options, [rule]));

        Assert.Equal(["profile 'strict', rule 'lab-probe': option 'Limit' expects a value of type Int32 but got 'many'"], error.Problems);
    }

    /// <summary>Records what discovery asks it to describe and answers with one loaded rule per plugin.</summary>
    private sealed class RecordingExecutor : IRuleExecutor
    {
        public List<(string AssemblyPath, IReadOnlyList<Profile> Profiles)> Described { get; } = [];

        public TimeSpan Overhead => TimeSpan.Zero;

        public Task<IReadOnlyList<RuleDescriptor>> DescribeAsync(string assemblyPath, string plugin, IReadOnlyList<Profile> profiles, CancellationToken cancellationToken)
        {
            lock (Described) Described.Add((assemblyPath, profiles));
            IReadOnlyList<RuleDescriptor> rules = [new RuleDescriptor { Id = "described-" + plugin, Plugin = plugin, AssemblyPath = assemblyPath }];
            return Task.FromResult(rules);
        }

        public Task<ExecutorResult> RunAsync(ActiveRule rule, EntrySubmission submission, CancellationToken cancellationToken) =>
            throw new InvalidOperationException("discovery never runs a rule");

        public string? HeldBackReason(RuleDescriptor rule) => null;

        public string? UnavailableReason { get; init; }
    }
}
