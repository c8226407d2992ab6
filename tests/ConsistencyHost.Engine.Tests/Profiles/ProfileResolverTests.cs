using ConsistencyHost.Engine.Intake;
using ConsistencyHost.Engine.Profiles;
using ConsistencyHost.Sdk.Findings;
using ConsistencyHost.Tests.Shared;

namespace ConsistencyHost.Engine.Tests.Profiles;

public sealed class ProfileResolverTests
{
    [Fact]
    public void Construct_ProfileNamingUnknownRule_StopsWithEveryProblemListed()
    {
        using var folder = PluginFolder.With("ConsistencyHost.Rules.SpectrumMetadata");
        var options = new EngineOptions
        {
            PluginsPath = folder.Path,
            Profiles =
            [
                new Profile
                {
                    Name = "publication",
                    Rules = new Dictionary<string, RuleSettings>
                    {
                        ["no-such-rule"] = new(),
                        ["spectrum-metadata"] = new() { Options = new Dictionary<string, string> { ["FrequencyTolerance"] = "7", ["Colour"] = "red" } },
                    },
                },
            ],
        };

        var error = Assert.Throws<ProfileConfigurationException>(() => new CheckEngine(options));

        Assert.Contains(error.Problems, p => p.Contains("unknown rule id 'no-such-rule'", StringComparison.Ordinal));
        Assert.Contains(error.Problems, p => p.Contains("has no option 'Colour'", StringComparison.Ordinal) && p.Contains("FrequencyTolerance", StringComparison.Ordinal));
        Assert.Contains(error.Problems, p => p.Contains("FrequencyTolerance", StringComparison.Ordinal) && p.Contains("between", StringComparison.Ordinal));
    }

    [Fact]
    public void Construct_OptionOfWrongType_NamesOptionAndExpectedType()
    {
        using var folder = PluginFolder.With("ConsistencyHost.Rules.SpectrumMetadata");
        var options = new EngineOptions
        {
            PluginsPath = folder.Path,
            Profiles = [new Profile { Name = "default", Rules = new Dictionary<string, RuleSettings> { ["spectrum-metadata"] = new() { Options = new Dictionary<string, string> { ["RequireSolvent"] = "sometimes" } } } }],
        };

        var error = Assert.Throws<ProfileConfigurationException>(() => new CheckEngine(options));

        Assert.Contains("option 'RequireSolvent' expects a value of type Boolean but got 'sometimes'", error.Message, StringComparison.Ordinal);
    }

    [Fact]
    public void Construct_LongOptionValue_IsCutInTheMessage()
    {
        using var folder = PluginFolder.With("ConsistencyHost.Rules.SpectrumMetadata");
        // A value pasted by mistake: 5000 characters where true or false belongs.
        var pasted = string.Concat(Enumerable.Repeat("0123456789", 500));
        var options = new EngineOptions
        {
            PluginsPath = folder.Path,
            Profiles = [new Profile { Name = "default", Rules = new Dictionary<string, RuleSettings> { ["spectrum-metadata"] = new() { Options = new Dictionary<string, string> { ["RequireSolvent"] = pasted } } } }],
        };

        var error = Assert.Throws<ProfileConfigurationException>(() => new CheckEngine(options));

        var problem = Assert.Single(error.Problems);
        Assert.Contains($"but got '{pasted[..ConfiguredValue.MaxShown]}… (cut, 5000 characters in all)'", problem, StringComparison.Ordinal);
        Assert.True(problem.Length < 300, problem);
        Assert.Equal(ProfileConfigurationException.ProfileTitle, error.Title);
    }

    [Fact]
    public void Construct_SeverityOverrideForMisspeltCode_IsRefusedWithTheRulesCodes()
    {
        using var folder = PluginFolder.With("ConsistencyHost.Rules.SpectrumMetadata");
        var options = new EngineOptions
        {
            PluginsPath = folder.Path,
            Profiles =
            [
                new Profile
                {
                    Name = "publication",
                    Rules = new Dictionary<string, RuleSettings>
                    {
                        ["spectrum-metadata"] = new() { Severities = new Dictionary<string, Severity> { ["solvent-not-sated"] = Severity.Error, ["solvent-not-stated"] = Severity.Error } },
                    },
                },
            ],
        };

        var error = Assert.Throws<ProfileConfigurationException>(() => new CheckEngine(options));

        var problem = Assert.Single(error.Problems);
        Assert.StartsWith("profile 'publication', rule 'spectrum-metadata': severity override for unknown finding code 'solvent-not-sated'", problem, StringComparison.Ordinal);
        Assert.Contains("solvent-not-stated", problem, StringComparison.Ordinal);
    }

    [Fact]
    public void Check_SeverityOverrideInProfile_ChangesFindingSeverity()
    {
        using var folder = PluginFolder.With("ConsistencyHost.Rules.SpectrumMetadata");
        var strict = new Profile
        {
            Name = "strict",
            Rules = new Dictionary<string, RuleSettings> { ["spectrum-metadata"] = new() { Severities = new Dictionary<string, Severity> { ["solvent-not-stated"] = Severity.Error } } },
        };
        var engine = new CheckEngine(new EngineOptions { PluginsPath = folder.Path, Profiles = [strict] });
        var entry = EngineTestKit.Entry(EngineTestKit.ProtonSpectrum(solvent: null));

        var relaxed = engine.Check(entry);
        var severe = engine.Check(entry with { Profile = "strict" });

        Assert.Equal(Severity.Warning, Assert.Single(relaxed.Findings).Finding.Severity);
        Assert.Equal(Severity.Error, Assert.Single(severe.Findings).Finding.Severity);
        Assert.Equal("strict", severe.Profile);
    }

    // Issue 13: a profile's StrictText keeps the refusal of unreadable reported text; the default profile reads it
    // leniently. "zz" is not a multiplicity (docs/spectra.md vocabulary); no solvent is stated.
    [Fact]
    public void Check_ProfileStrictText_RefusesWhatTheDefaultProfileReportsAsAFinding()
    {
        using var folder = PluginFolder.With("ConsistencyHost.Rules.SpectrumMetadata");
        var engine = new CheckEngine(new EngineOptions { PluginsPath = folder.Path, Profiles = [new Profile { Name = "refusing", StrictText = true }] });
        const string text = "1H NMR (400 MHz) δ 7.86 (d, J = 8.2 Hz, 2H), 7.26 (zz, 2H), 2.57 (s, 3H).";
        var entry = new EntrySubmission { EntryId = "AIS-LQ-TEST", ReportedText = [text] };

        var lenient = engine.Check(entry);
        var error = Assert.Throws<EntryInputException>(() => engine.Check(entry with { Profile = "refusing" }));

        var unreadable = Assert.Single(lenient.Findings, f => f.Finding.Code == "text-unreadable");
        Assert.Equal(Severity.Warning, unreadable.Finding.Severity);
        Assert.Contains(lenient.Findings, f => f.Finding.Code == "solvent-not-stated");
        Assert.Contains("'zz'", error.Message, StringComparison.Ordinal);
    }

    [Fact]
    public void Check_RuleDisabledInProfile_DoesNotRun()
    {
        using var folder = PluginFolder.With("ConsistencyHost.Rules.SpectrumMetadata");
        var quiet = new Profile { Name = "quiet", Rules = new Dictionary<string, RuleSettings> { ["spectrum-metadata"] = new() { Enabled = false } } };
        var engine = new CheckEngine(new EngineOptions { PluginsPath = folder.Path, Profiles = [quiet] });

        var report = engine.Check(EngineTestKit.Entry(EngineTestKit.ProtonSpectrum(solvent: null)) with { Profile = "quiet" });

        Assert.Empty(report.RuleRuns);
        Assert.Empty(report.Findings);
    }
}
