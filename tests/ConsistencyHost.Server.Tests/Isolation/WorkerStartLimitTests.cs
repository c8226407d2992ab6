using ConsistencyHost.Engine.Plugins;
using ConsistencyHost.Isolation;
using ConsistencyHost.Tests.Shared;

namespace ConsistencyHost.Server.Tests.Isolation;

/// <summary>A worker that does not start in time: the refusal says which step of the start ran out and its limit.</summary>
[System.Runtime.Versioning.SupportedOSPlatform("linux")] // workers rely on prlimit, unshare and setpriv
public sealed class WorkerStartLimitTests
{
    [Fact]
    public async Task Describe_WorkerSlowerThanTheStartLimit_IsRefusedNamingTheHandshakeAndTheLimit()
    {
        using var folder = PluginFolder.With("ConsistencyHost.Fixtures.ThrowingRule");
        var assembly = Path.Combine(folder.Path, "ConsistencyHost.Fixtures.ThrowingRule", "ConsistencyHost.Fixtures.ThrowingRule.dll");
        // One millisecond: no process start, let alone .NET and Kestrel, fits in it, so the time-out is certain.
        var tooShort = new IsolationOptions { WorkerAssemblyPath = new IsolationOptions().WorkerAssemblyPath, StartTimeout = TimeSpan.FromMilliseconds(1) };
        await using var executor = new WorkerRuleExecutor(tooShort);

        var rules = await executor.DescribeAsync(assembly, "ConsistencyHost.Fixtures.ThrowingRule.dll", [], CancellationToken.None)
            .WaitAsync(TimeSpan.FromSeconds(60));

        var refused = Assert.Single(rules);
        Assert.False(refused.IsLoaded);
        Assert.Contains("did not print its handshake line within the start limit of 0.001 s", refused.LoadMessage, StringComparison.Ordinal);
        Assert.Contains("it was killed", refused.LoadMessage, StringComparison.Ordinal);

        // The same plugin with the default limit describes normally: the refusal was the limit's, not the plugin's.
        await using var normal = new WorkerRuleExecutor();
        var described = await normal.DescribeAsync(assembly, "ConsistencyHost.Fixtures.ThrowingRule.dll", [], CancellationToken.None).WaitAsync(TimeSpan.FromSeconds(120));
        Assert.Equal("fixture-throws", Assert.Single(described).Id);
        Assert.True(Assert.Single(described).IsLoaded);
    }
}
