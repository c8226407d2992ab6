using ConsistencyHost.Engine;
using ConsistencyHost.Engine.Intake;
using ConsistencyHost.Engine.Profiles;
using ConsistencyHost.Sdk.Entries;
using ConsistencyHost.Sdk.Findings;
using ConsistencyHost.Tests.Shared;

namespace ConsistencyHost.Rules.Tests;

/// <summary>What the rules must not flag, and how a profile changes the outcome.</summary>
public sealed class RuleBehaviourTests
{
    [Fact]
    public void Check_CouplingsToFluorine_NotHeldAgainstMissingProtonPartner()
    {
        // 4-Fluoroanisole in CDCl3: each aromatic multiplet carries an H–F coupling besides the ortho H–H one.
        // Typical literature values, from memory.
        var report = BuiltInRules.Check("COc1ccc(F)cc1",
            "1H NMR (400 MHz, CDCl3) δ 6.97 (dd, J = 9.1, 8.1 Hz, 2H), 6.83 (dd, J = 9.1, 4.4 Hz, 2H), 3.77 (s, 3H).").AllRulesRan();

        Assert.Empty(report.Codes("coupling-partners"));
    }

    [Fact]
    public void Check_ApparentTripletsWithAveragedJ_NoPartnerFinding()
    {
        // Acetanilide in DMSO-d6: the meta protons' "t" averages two slightly different ortho couplings, so
        // its J differs from the para triplet's by 0.5 Hz (common practice). Typical values, from memory.
        var report = BuiltInRules.Check("CC(=O)Nc1ccccc1",
            "1H NMR (400 MHz, DMSO-d6) δ 9.91 (s, 1H), 7.58 (d, J = 7.9 Hz, 2H), 7.28 (t, J = 7.9 Hz, 2H), 7.01 (t, J = 7.4 Hz, 1H), 2.04 (s, 3H).").AllRulesRan();

        Assert.Empty(report.Codes("coupling-partners"));
    }

    [Fact]
    public void Check_PrimaryAmideNH2AsTwoSinglets_NoFinding()
    {
        // Benzamide in DMSO-d6: slow C–N rotation makes the two NH protons distinct (cis/trans to O), reported
        // as two broad singlets (common practice). Typical values, from memory.
        var report = BuiltInRules.Check("NC(=O)c1ccccc1",
            "1H NMR (400 MHz, DMSO-d6) δ 7.97 (br s, 1H), 7.88 (d, J = 7.4 Hz, 2H), 7.51 (t, J = 7.3 Hz, 1H), 7.44 (t, J = 7.5 Hz, 2H), 7.36 (br s, 1H).").AllRulesRan();

        Assert.Empty(report.Findings);
    }

    [Fact]
    public void Check_ExchangeableProtonsAbsentInD2O_NoCountFinding()
    {
        // Glycine in D2O: the NH3+/CO2H protons exchange; only the CH2 singlet remains (common practice; 3.55 ppm
        // is a typical value, from memory).
        var report = BuiltInRules.Check("NCC(=O)O", "1H NMR (400 MHz, D2O) δ 3.55 (s, 2H).").AllRulesRan();

        Assert.DoesNotContain(report.Findings, f => f.Finding.Severity >= Severity.Warning);
    }

    [Fact]
    public void Check_DiastereotopicPairReportedSeparately_NoFinding()
    {
        // Methyl (S)-3-phenylbutanoate: the CH2 protons next to the stereocentre are diastereotopic and are
        // reported as two dd (common practice). Typical values, from memory.
        var report = BuiltInRules.Check("COC(=O)C[C@H](C)c1ccccc1",
            "1H NMR (400 MHz, CDCl3) δ 7.32–7.18 (m, 5H), 3.62 (s, 3H), 3.28 (m, 1H), 2.63 (dd, J = 15.1, 7.0 Hz, 1H), 2.55 (dd, J = 15.1, 8.2 Hz, 1H), 1.30 (d, J = 7.0 Hz, 3H).").AllRulesRan();

        var serious = report.Findings.Where(f => f.Finding.Severity >= Severity.Warning).Select(f => f.Finding.Message).ToList();
        Assert.True(serious.Count == 0, string.Join("\n", serious));
    }

    [Fact]
    public void Profile_ToleranceForMissingCarbonLines_TurnsInfoIntoWarning()
    {
        // Ethyl acetate (Gottlieb et al. 1997, CDCl3) with its carbonyl line left out.
        var entry = PublishedEntries.Get("ethyl acetate", "CDCl3");
        var text = entry.Text.Replace("171.36, ", "", StringComparison.Ordinal);
        var strict = new Profile
        {
            Name = "strict",
            Rules = new Dictionary<string, RuleSettings> { ["signal-count"] = new() { Options = new Dictionary<string, string> { ["TolerableMissingCarbonLines"] = "0" } } },
        };
        var engine = new CheckEngine(new EngineOptions { PluginsPath = RepoPaths.BuiltInPlugins, Profiles = [strict], RuleDeadline = TimeSpan.FromSeconds(30) });
        EntrySubmission Submission(string profile) => new()
        {
            EntryId = "AIS-LQ-P1",
            Structure = new StructureSource(StructureFormat.Smiles, entry.Smiles),
            ReportedText = [text],
            Profile = profile,
        };

        var relaxed = engine.Check(Submission("default")).Findings.Single(f => f.Finding.Code == "too-few-13c-signals");
        var severe = engine.Check(Submission("strict")).Findings.Single(f => f.Finding.Code == "too-few-13c-signals");

        Assert.Equal(Severity.Info, relaxed.Finding.Severity);
        Assert.Equal(Severity.Warning, severe.Finding.Severity);
    }
}
