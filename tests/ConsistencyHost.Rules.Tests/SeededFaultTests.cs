namespace ConsistencyHost.Rules.Tests;

/// <summary>
/// Published entries (Fixtures/published-impurities.tsv, from Gottlieb et al. 1997 and Fulmer et al. 2010)
/// with one fault seeded each; every fault must be caught by the right rule with the right code. The clean
/// entries pass every rule (PublishedImpurityEntryTests), so each finding here is caused by its fault.
/// </summary>
public sealed class SeededFaultTests
{
    public static TheoryData<string, string, string, string, string, string, string> Faults() => new()
    {
        // fault, entry, solvent, replace, with, rule, code
        { "wrong integral", "ethyl acetate", "CDCl3", "4.12 (q, J = 7 Hz, 2H)", "4.12 (q, J = 7 Hz, 3H)", "integral-ratio", "total-protons-mismatch" },
        { "extra signal", "triethylamine", "CDCl3", "1.03 (t, J = 7 Hz, 9H)", "1.03 (t, J = 7 Hz, 9H), 0.85 (s, 3H)", "signal-count", "too-many-1h-signals" },
        { "extra 13C line", "toluene", "DMSO-d6", "125.29, 20.99.", "125.29, 60.10, 20.99.", "signal-count", "too-many-13c-signals" },
        { "one J changed", "diethyl ether", "CDCl3", "1.21 (t, J = 7 Hz, 6H)", "1.21 (t, J = 9 Hz, 6H)", "coupling-partners", "j-without-partner" },
        { "residual solvent line reported", "ethyl acetate", "CDCl3", "2.05 (s, 3H)", "7.26 (s, 1H), 2.05 (s, 3H)", "solvent-residual", "residual-solvent-reported" },
        { "water counted", "2-propanol", "DMSO-d6", "1.04 (d, J = 6 Hz, 6H)", "3.33 (s, 2H), 1.04 (d, J = 6 Hz, 6H)", "solvent-residual", "water-reported" },
        { "multiplicity changed", "ethyl acetate", "DMSO-d6", "1.17 (t, J = 7 Hz, 3H)", "1.17 (q, J = 7 Hz, 3H)", "coupling-partners", "multiplicity-impossible" },
        { "J count does not fit letters", "2-propanol", "CDCl3", "1.22 (d, J = 6 Hz, 6H)", "1.22 (dd, J = 6 Hz, 6H)", "coupling-partners", "j-count-mismatch" },
        { "q→t on the ethyl CH2", "ethyl acetate", "CDCl3", "4.12 (q, J = 7 Hz, 2H)", "4.12 (t, J = 7 Hz, 2H)", "coupling-partners", "pattern-too-few-lines" },
        { "q→t on the ethyl CH2", "diethyl ether", "DMSO-d6", "3.38 (q, J = 7 Hz, 4H)", "3.38 (t, J = 7 Hz, 4H)", "coupling-partners", "pattern-too-few-lines" },
        { "sept→q on the isopropyl CH", "2-propanol", "CDCl3", "4.04 (sept, J = 6 Hz, 1H)", "4.04 (q, J = 6 Hz, 1H)", "coupling-partners", "pattern-too-few-lines" },
        { "count no class makes", "tetrahydrofuran", "CDCl3", "3.76 (m, 4H), 1.85 (m, 4H)", "3.76 (m, 5H), 1.85 (m, 3H)", "integral-ratio", "impossible-signal-count" },
    };

    [Theory]
    [MemberData(nameof(Faults))]
    public void Check_SeededFault_CaughtByItsRule(string fault, string name, string solvent, string replace, string with, string rule, string code)
    {
        var entry = PublishedEntries.Get(name, solvent);
        Assert.Contains(replace, entry.Text, StringComparison.Ordinal);

        var report = BuiltInRules.Check(entry.Smiles, entry.Text.Replace(replace, with, StringComparison.Ordinal)).AllRulesRan();

        Assert.True(report.Codes(rule).Contains(code), $"{fault}: expected {rule}/{code}, got " +
            string.Join(", ", report.Findings.Select(f => $"{f.RuleId}/{f.Finding.Code}")));
    }

    [Fact]
    public void Check_WrongIsomerAsStructure_CaughtByCountRules()
    {
        // The tetrahydrofuran entry submitted with 2-butanone (same formula, C4H8O) as its structure.
        var entry = PublishedEntries.Get("tetrahydrofuran", "CDCl3");

        var report = BuiltInRules.Check("CCC(C)=O", entry.Text).AllRulesRan();

        Assert.Contains("impossible-signal-count", report.Codes("integral-ratio"));
        Assert.Contains("too-few-13c-signals", report.Codes("signal-count"));
    }

    [Fact]
    public void Check_HrmsWithoutElectronMass_CaughtByMassFormula()
    {
        // Ethyl acetate, C4H8O2: M = 88.052429 u (nmr-data-standards §7.3, NIST masses); [M+Na]+ with the electron
        // mass removed is 88.052429 + 22.989769 - 0.000549 = 111.041650; without that correction 111.042198.
        var entry = PublishedEntries.Get("ethyl acetate", "CDCl3");
        var hrms = "HRMS (ESI) m/z: [M + Na]+ calcd for C4H8NaO2 111.0422; found 111.0419.";

        var report = BuiltInRules.Check(entry.Smiles, entry.Text, hrms).AllRulesRan();

        Assert.Contains("electron-mass-omitted", report.Codes("mass-formula"));
    }
}
