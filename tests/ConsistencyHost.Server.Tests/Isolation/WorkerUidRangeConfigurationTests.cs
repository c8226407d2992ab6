using ConsistencyHost.Engine.Profiles;
using ConsistencyHost.Isolation;
using ConsistencyHost.Server.Hosting;
using Microsoft.Extensions.Configuration;

namespace ConsistencyHost.Server.Tests.Isolation;

/// <summary>Isolation:WorkerUidRange is read as "first-last"; anything else stops start-up naming the key and the form.</summary>
public sealed class WorkerUidRangeConfigurationTests
{
    [Theory]
    [InlineData("700000000-700009999", 700_000_000, 700_009_999)]
    [InlineData(" 60000 - 60000 ", 60_000, 60_000)]
    [InlineData("1-2147483646", 1, 2_147_483_646)]
    public void Parse_FirstDashLast_IsTheInclusiveRange(string text, int first, int last)
    {
        var range = UidRange.Parse(text, out var problem);

        Assert.Null(problem);
        Assert.Equal(new UidRange(first, last), range);
        Assert.Equal(last - first + 1, range!.Value.Count);
    }

    [Theory]
    [InlineData("0-100", "uid 0 is root")] // a worker must never be root
    [InlineData("500-400", "1 ≤ first ≤ last")]
    [InlineData("1-2147483647", "≤ 2147483646")]
    [InlineData("700000000", "'first-last'")]
    [InlineData("-5-10", "'first-last'")]
    [InlineData("a-b", "'first-last'")]
    public void CreateExecutor_BadRange_StopsStartUpNamingTheKeyAndTheExpectedForm(string text, string expected)
    {
        var section = new ConfigurationBuilder().AddInMemoryCollection([new("Isolation:WorkerUidRange", text)]).Build().GetSection("Isolation");

        var error = Assert.Throws<ProfileConfigurationException>(() => IsolationConfiguration.CreateExecutor(section));

        Assert.Equal(ProfileConfigurationException.HostTitle, error.Title);
        var problem = Assert.Single(error.Problems);
        Assert.StartsWith("Isolation:WorkerUidRange: '", problem, StringComparison.Ordinal);
        Assert.Contains(expected, problem, StringComparison.Ordinal);
    }
}
