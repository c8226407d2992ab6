using ConsistencyHost.Engine;
using ConsistencyHost.Engine.Intake;
using ConsistencyHost.Engine.Profiles;
using ConsistencyHost.Engine.Reports;
using ConsistencyHost.Sdk.Entries;
using ConsistencyHost.Sdk.Findings;
using ConsistencyHost.Spectra.Model;
using ConsistencyHost.Tests.Shared;

namespace ConsistencyHost.Rules.MassFormula.Tests;

/// <summary>Runs the mass-formula rule, loaded from disk, through the real engine.</summary>
public sealed class MassFormulaTestKit : IDisposable
{
    public const string RuleId = "mass-formula";

    // Structures. Formulae cross-checked with RDKit CalcMolFormula (Debian python3-rdkit).
    public const string Caffeine = "Cn1cnc2c1c(=O)n(C)c(=O)n2C"; // C8H10N4O2
    public const string AcetylPhenylalanineMethylEster = "COC(=O)[C@@H](Cc1ccccc1)NC(C)=O"; // C12H15NO3
    public const string BenzoicAcid = "OC(=O)c1ccccc1"; // C7H6O2
    public const string Naphthalene = "c1ccc2ccccc2c1"; // C10H8
    public const string Tetramethylammonium = "C[N+](C)(C)C"; // C4H12N+
    public const string Phenylethanol = "CC(O)c1ccccc1"; // C8H10O
    public const string DibenzylEthylenediamine = "C(NCc1ccccc1)CNCc1ccccc1"; // C16H20N2
    public const string Acetanilide = "CC(=O)Nc1ccccc1"; // C8H9NO
    public const string MethylBenzamide = "CNC(=O)c1ccccc1"; // C8H9NO, an isomer of acetanilide

    private readonly PluginFolder _folder = PluginFolder.With("ConsistencyHost.Rules.MassFormula");
    private CheckEngine? _default;

    public void Dispose() => _folder.Dispose();

    private CheckEngine Default => _default ??= Engine();

    /// <summary>An engine with the default profile plus the given ones.</summary>
    public CheckEngine Engine(params Profile[] profiles) => new(new EngineOptions
    {
        PluginsPath = _folder.Path,
        RuleDeadline = TimeSpan.FromSeconds(30),
        Profiles = profiles,
    });

    /// <summary>The rule's findings for a structure (null for none) and reported text.</summary>
    public IReadOnlyList<Finding> Check(string? smiles, string? text, string? formula = null, string? profile = null, CheckEngine? engine = null) =>
        Findings((engine ?? Default).Check(Submission(smiles, text, formula) with { Profile = profile }));

    /// <summary>The rule's findings for a structure and one structured HRMS claim (label forms the text reader does not read).</summary>
    public IReadOnlyList<Finding> CheckClaim(string? smiles, HrmsClaim claim, string? formula = null) =>
        Findings(Default.Check(Submission(smiles, null, formula) with { Hrms = [claim] }));

    /// <summary>A claim as the text reader would give it, decimals counted from the written numbers.</summary>
    public static HrmsClaim Claim(string? ion, string formula, string calculated, string? found = null) => new(
        "ESI", ion, formula, double.Parse(calculated, System.Globalization.CultureInfo.InvariantCulture),
        found is null ? null : double.Parse(found, System.Globalization.CultureInfo.InvariantCulture),
        Decimals(calculated), found is null ? 0 : Decimals(found), 0);

    public static string Evidence(Finding finding, string name) =>
        finding.Evidence.Single(kv => kv.Key == name).Value;

    public static string[] Codes(IEnumerable<Finding> findings) => findings.Select(f => f.Code).Order(StringComparer.Ordinal).ToArray();

    private static int Decimals(string number) => number.Contains('.', StringComparison.Ordinal) ? number.Length - number.IndexOf('.', StringComparison.Ordinal) - 1 : 0;

    private static EntrySubmission Submission(string? smiles, string? text, string? formula) => new()
    {
        EntryId = "AIS-MS-T001",
        Structure = smiles is null ? null : new StructureSource(StructureFormat.Smiles, smiles),
        ReportedText = text is null ? [] : [text],
        Formula = formula,
    };

    private static IReadOnlyList<Finding> Findings(CheckReport report)
    {
        var run = Assert.Single(report.RuleRuns, r => r.RuleId == RuleId);
        Assert.True(run.Status == RuleRunStatus.Ok, $"rule run {run.Status}: {run.Message}");
        return report.Findings.Where(f => f.RuleId == RuleId).Select(f => f.Finding).ToList();
    }
}
