using ConsistencyHost.Sdk.Findings;
using static ConsistencyHost.Rules.MassFormula.Tests.MassFormulaTestKit;

namespace ConsistencyHost.Rules.MassFormula.Tests;

/// <summary>
/// Calculated m/z against the structure. Masses: NIST nuclide masses and mₑ = 0.000548580 u
/// (nmr-data-standards.md §7.1–7.2); m/z = (Σ atom masses − z·mₑ)/|z| (§7.3).
/// </summary>
public sealed class CalculatedMassTests(MassFormulaTestKit kit) : IClassFixture<MassFormulaTestKit>
{
    [Theory]
    // Source: nmr-data-standards.md §7.3 worked example: caffeine [M+H]+ calcd 195.087652.
    [InlineData(Caffeine, "HRMS (ESI) m/z: [M + H]+ calcd for C8H11N4O2 195.0877; found 195.0874.")]
    // Source: same worked example, caffeine [M+Na]+ calcd 217.069596.
    [InlineData(Caffeine, "HRMS (ESI) m/z: [M + Na]+ calcd for C8H10N4O2Na 217.0696; found 217.0699.")]
    // Source: ACS-style example "HRMS (ESI-TOF) m/z: [M + Na]+ calcd for C12H15NO3Na 244.0944" quoted in
    // nmr-data-standards.md §7.3 (third-party paraphrase of the ACS guidelines); computed 244.094414 there.
    [InlineData(AcetylPhenylalanineMethylEster, "HRMS (ESI-TOF) m/z: [M + Na]+ calcd for C12H15NO3Na 244.0944; found 244.0941.")]
    // Six decimals, as §7.3 gives them.
    [InlineData(Caffeine, "HRMS (ESI) m/z: [M+H]+ calcd for C8H11N4O2 195.087652; found 195.0874.")]
    // Common practice: the neutral formula M written before the ion is accepted.
    [InlineData(Caffeine, "HRMS (ESI) m/z: calcd for C8H10N4O2 [M+H]+ 195.0877; found 195.0874.")]
    public void Check_PublishedWorkedExample_NoFinding(string smiles, string text)
    {
        Assert.Empty(kit.Check(smiles, text));
    }

    // Each value below is computed here from NIST masses (§7.1): H 1.00782503223, C 12, N 14.00307400443,
    // O 15.99491461957, Na 22.9897692820, K 38.9637064864, Cl 34.968852682, Li 7.0160034366 (from memory of
    // the NIST table), Ag 106.9050916 (from memory of the NIST table); mₑ 0.000548580. Each was cross-checked
    // with RDKit ExactMolWt of the neutral molecule (Debian python3-rdkit).
    [Theory]
    // Caffeine C8H10N4O2 M = 194.080376; [M+K]+ = M + 38.9637064864 − mₑ = 233.043533.
    [InlineData(Caffeine, "HRMS (ESI) m/z: [M+K]+ calcd for C8H10N4O2K 233.0435; found 233.0431.")]
    // Benzoic acid C7H6O2 M = 122.036779; [M−H]− = M − 1.00782503223 + mₑ = 121.029503.
    [InlineData(BenzoicAcid, "HRMS (ESI) m/z: [M−H]− calcd for C7H5O2 121.0295; found 121.0297.")]
    // Naphthalene C10H8 M = 128.062600; M+• = M − mₑ = 128.062052 (electron ionisation).
    [InlineData(Naphthalene, "HRMS (EI) m/z: M+• calcd for C10H8 128.0621; found 128.0618.")]
    // Tetramethylammonium C4H12N+: atoms 74.096974, cation = 74.096974 − mₑ = 74.096426 (RDKit ExactMolWt 74.096426).
    [InlineData(Tetramethylammonium, "HRMS (ESI) m/z: [M]+ calcd for C4H12N 74.0964; found 74.0966.")]
    // 1-Phenylethanol C8H10O M = 122.073165; [M+H−H2O]+ = C8H9+ = 122.073165 − 1.00782503223 − 15.99491461957 − mₑ = 105.069877.
    [InlineData(Phenylethanol, "HRMS (ESI) m/z: [M+H−H2O]+ calcd for C8H9 105.0699; found 105.0697.")]
    // N,N'-Dibenzylethylenediamine C16H20N2 M = 240.162649; [M+2H]2+ = (M + 2·1.00782503223 − 2·mₑ)/2 = 121.088601.
    [InlineData(DibenzylEthylenediamine, "HRMS (ESI) m/z: [M+2H]2+ calcd for C16H22N2 121.0886; found 121.0888.")]
    // Acetanilide C8H9NO M = 135.068414; [M+Cl]− = M + 34.968852682 + mₑ = 170.037815.
    [InlineData(Acetanilide, "HRMS (ESI) m/z: [M+Cl]− calcd for C8H9ClNO 170.0378; found 170.0375.")]
    // Acetanilide [M+HCOO]− = M + CHO2 (44.997655) + mₑ = 180.066617.
    [InlineData(Acetanilide, "HRMS (ESI) m/z: [M+HCOO]− calcd for C9H10NO3 180.0666; found 180.0669.")]
    // Acetanilide [M+NH4]+ = M + NH4 (18.034374) − mₑ = 153.102239.
    [InlineData(Acetanilide, "HRMS (ESI) m/z: [M+NH4]+ calcd for C8H13N2O 153.1022; found 153.1020.")]
    // Acetanilide [M+Li]+ = M + 7.0160034366 − mₑ = 142.083869.
    [InlineData(Acetanilide, "HRMS (ESI) m/z: [M+Li]+ calcd for C8H9LiNO 142.0839; found 142.0836.")]
    // Acetanilide [M+Ag]+ (107Ag) = M + 106.9050916 − mₑ = 241.972957.
    [InlineData(Acetanilide, "HRMS (ESI) m/z: [M+Ag]+ calcd for C8H9AgNO 241.9730; found 241.9727.")]
    public void Check_IonComputedFromNistMasses_NoFinding(string smiles, string text)
    {
        Assert.Empty(kit.Check(smiles, text));
    }

    [Fact]
    public void Check_CaffeineElectronOmitted_WarnsWithBothValues()
    {
        // Source: nmr-data-standards.md §7.3: caffeine [M+H]+ is 195.087652, "or 195.088201 if mₑ is wrongly omitted".
        var finding = Assert.Single(kit.Check(Caffeine, "HRMS (ESI) m/z: [M+H]+ calcd for C8H11N4O2 195.0882; found 195.0879."));

        Assert.Equal("electron-mass-omitted", finding.Code);
        Assert.Equal(Severity.Warning, finding.Severity);
        Assert.Equal("195.087652", Evidence(finding, "expected_mz"));
        Assert.Equal("195.0882", Evidence(finding, "reported_mz"));
        Assert.Equal("195.088201", Evidence(finding, "mz_without_electron"));
        Assert.Empty(finding.Atoms);
    }

    [Theory]
    // Source: nmr-data-standards.md §7.3: C12H15NO3Na+ "without the electron correction it would be 244.0950".
    [InlineData(AcetylPhenylalanineMethylEster, "HRMS (ESI) m/z: [M+Na]+ calcd for C12H15NO3Na 244.0950.", "244.094414")]
    // Benzoic acid [M−H]− without the electron: 121.029503 − mₑ = 121.028954 → 121.0290 (computed above).
    [InlineData(BenzoicAcid, "HRMS (ESI) m/z: [M−H]− calcd for C7H5O2 121.0290.", "121.029503")]
    // Dication: (240.162649 + 2·1.00782503223)/2 = 121.089149 → 121.0891, 0.27 mDa above 121.088601.
    [InlineData(DibenzylEthylenediamine, "HRMS (ESI) m/z: [M+2H]2+ calcd for C16H22N2 121.0891.", "121.088601")]
    public void Check_ElectronOmittedAnyCharge_IsElectronMassOmitted(string smiles, string text, string expected)
    {
        var finding = Assert.Single(kit.Check(smiles, text));

        Assert.Equal("electron-mass-omitted", finding.Code);
        Assert.Equal(expected, Evidence(finding, "expected_mz"));
    }

    [Fact]
    public void Check_ThreeDecimalsCannotShowElectron_NoFinding()
    {
        // 195.087652 and 195.088201 (§7.3) both round to 195.088: with three decimals the rounding hides the electron.
        Assert.Empty(kit.Check(Caffeine, "HRMS (ESI) m/z: [M+H]+ calcd for C8H11N4O2 195.088."));
    }

    [Fact]
    public void Check_SodiumAdductWithExtraHydrogen_IsIonFormulaMismatchOnly()
    {
        // A frequent slip: H and Na both added. C8H11N4NaO2+ = 194.080376 + 1.00782503223 + 22.9897692820 − mₑ
        // = 218.077421 (computed from NIST masses, §7.1); the structure's [M+Na]+ is 217.069596 (§7.3).
        var findings = kit.Check(Caffeine, "HRMS (ESI) m/z: [M+Na]+ calcd for C8H11N4O2Na 218.0774.");

        var finding = Assert.Single(findings);
        Assert.Equal("ion-formula-mismatch", finding.Code);
        Assert.Equal(Severity.Error, finding.Severity);
        Assert.Equal("C8H10N4NaO2+", Evidence(finding, "expected_ion_formula"));
        Assert.Equal("C8H11N4O2Na", Evidence(finding, "reported_ion_formula"));
        Assert.Equal("218.077421", Evidence(finding, "reported_formula_mz"));
        Assert.Contains("is that of the written formula", finding.Message, StringComparison.Ordinal);
    }

    [Fact]
    public void Check_WrongAdductFoundFitsItToo_AlsoFoundOutsideWindow()
    {
        // The measured ion is the wrong one as well: 218.0771 is 34.6 mDa from the structure's 217.069596.
        var codes = Codes(kit.Check(Caffeine, "HRMS (ESI) m/z: [M+Na]+ calcd for C8H11N4O2Na 218.0774; found 218.0771."));

        Assert.Equal(["found-outside-window", "ion-formula-mismatch"], codes);
    }

    [Fact]
    public void Check_RightValueWrongFormulaText_IsIonFormulaMismatch()
    {
        // 195.0877 is right for caffeine [M+H]+ (§7.3), but C8H12N4O2 is not C8H11N4O2.
        var finding = Assert.Single(kit.Check(Caffeine, "HRMS (ESI) m/z: [M+H]+ calcd for C8H12N4O2 195.0877."));

        Assert.Equal("ion-formula-mismatch", finding.Code);
        Assert.Contains("only the written formula is wrong", finding.Message, StringComparison.Ordinal);
    }

    [Theory]
    // 195.0921 fits neither 195.087652 nor 195.088201 (§7.3).
    [InlineData("HRMS (ESI) m/z: [M+H]+ calcd for C8H11N4O2 195.0921.", "4.45")]
    // One unit in the fourth decimal too high is beyond rounding: 195.0879 − 195.087652 = 0.248 mDa > 0.1 mDa.
    [InlineData("HRMS (ESI) m/z: [M+H]+ calcd for C8H11N4O2 195.0879.", "0.25")]
    public void Check_CalculatedFitsNothing_IsCalculatedMassMismatch(string text, string differenceMDa)
    {
        var finding = Assert.Single(kit.Check(Caffeine, text));

        Assert.Equal("calculated-mass-mismatch", finding.Code);
        Assert.Equal(Severity.Error, finding.Severity);
        Assert.Equal(differenceMDa, Evidence(finding, "difference_mda"));
        Assert.Equal("195.087652", Evidence(finding, "expected_mz"));
    }

    [Fact]
    public void Check_PermanentCationElectronOmitted_Warns()
    {
        // Tetramethylammonium: atom masses 74.096974 (computed above), cation 74.096426; 74.0970 is the atoms alone.
        var finding = Assert.Single(kit.Check(Tetramethylammonium, "HRMS (ESI) m/z: [M]+ calcd for C4H12N 74.0970."));

        Assert.Equal("electron-mass-omitted", finding.Code);
    }
}
