using ConsistencyHost.LoadGenerator.CommandLine;

namespace ConsistencyHost.LoadGenerator.Tests;

public sealed class DurationsTests
{
    [Theory]
    [InlineData("500ms", 0.5)]
    [InlineData("20s", 20)]
    [InlineData("10m", 600)]
    [InlineData("1.5h", 5400)]
    public void Parse_NumberAndUnit_IsThatManySeconds(string text, double seconds)
    {
        Assert.Equal(TimeSpan.FromSeconds(seconds), Durations.Parse("--duration", text));
    }

    [Theory]
    [InlineData("30")]
    [InlineData("-5s")]
    [InlineData("0s")]
    [InlineData("tens")]
    public void Parse_NotAPositiveNumberWithAUnit_NamesTheOptionAndTheExpectedForm(string text)
    {
        var error = Assert.Throws<UsageException>(() => Durations.Parse("--duration", text));

        Assert.Equal($"--duration: '{text}' is not a duration; expected a positive number and a unit, e.g. 500ms, 30s, 10m, 1h", error.Message);
    }
}
