using ConsistencyHost.Engine.Profiles;
using ConsistencyHost.Sdk.Findings;
using static ConsistencyHost.Rules.MassFormula.Tests.MassFormulaTestKit;

namespace ConsistencyHost.Rules.MassFormula.Tests;

/// <summary>A group leader's profile changes the outcome: windows and severities are options, not constants.</summary>
public sealed class ProfileTests(MassFormulaTestKit kit) : IClassFixture<MassFormulaTestKit>
{
    // Caffeine [M+H]+ 195.087652 (§7.3); found 195.0890 is 6.91 ppm (1.35 mDa) high.
    private const string SevenPpmHigh = "HRMS (ESI) m/z: [M+H]+ calcd for C8H11N4O2 195.0877; found 195.0890.";

    private static Profile With(string name, Dictionary<string, string>? options = null, Dictionary<string, Severity>? severities = null) => new()
    {
        Name = name,
        Rules = new Dictionary<string, RuleSettings>
        {
            [RuleId] = new() { Options = options ?? [], Severities = severities ?? [] },
        },
    };

    [Fact]
    public void Check_FoundWindowTenPpm_SevenPpmPasses()
    {
        var engine = kit.Engine(With("relaxed", options: new() { ["FoundWindowPpm"] = "10" }));

        Assert.Equal("found-outside-window", Assert.Single(kit.Check(Caffeine, SevenPpmHigh, engine: engine)).Code);
        Assert.Empty(kit.Check(Caffeine, SevenPpmHigh, profile: "relaxed", engine: engine));
    }

    [Fact]
    public void Check_AbsoluteWindowThreeMilliDaltons_SevenPpmPasses()
    {
        // Source: §7.3 paraphrase of the ACS guidelines, "±5 ppm (or 3 mDa)"; 1.35 mDa is inside 3 mDa.
        var engine = kit.Engine(With("or-3-mda", options: new() { ["FoundWindowMDa"] = "3" }));

        Assert.Empty(kit.Check(Caffeine, SevenPpmHigh, profile: "or-3-mda", engine: engine));
    }

    [Fact]
    public void Check_SeverityOverride_FoundOutsideWindowBecomesError()
    {
        var engine = kit.Engine(With("strict", severities: new() { ["found-outside-window"] = Severity.Error }));

        Assert.Equal(Severity.Warning, Assert.Single(kit.Check(Caffeine, SevenPpmHigh, engine: engine)).Severity);
        Assert.Equal(Severity.Error, Assert.Single(kit.Check(Caffeine, SevenPpmHigh, profile: "strict", engine: engine)).Severity);
    }

    [Theory]
    [InlineData("FoundWindowPpm", "0")]
    [InlineData("MinimumCalculatedToleranceMDa", "0.6")]
    public void Construct_OptionOutOfRange_StopsWithTheOptionNamed(string option, string value)
    {
        var error = Assert.Throws<ProfileConfigurationException>(() => kit.Engine(With("bad", options: new() { [option] = value })));

        Assert.Contains(option, error.Message, StringComparison.Ordinal);
    }
}
