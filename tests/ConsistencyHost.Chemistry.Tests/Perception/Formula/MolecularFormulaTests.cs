using ConsistencyHost.Chemistry.Perception.Formula;
using ConsistencyHost.Chemistry.Smiles;

namespace ConsistencyHost.Chemistry.Tests.Perception.Formula;

public sealed class MolecularFormulaTests
{
    [Theory]
    [InlineData("Cn1cnc2c1c(=O)n(C)c(=O)n2C", "C8H10N4O2")] // caffeine; nmr-data-standards.md §7.3
    [InlineData("CCOC(C)=O", "C4H8O2")] // ethyl acetate; §7.3
    [InlineData("C[NH3+]", "CH6N+")] // Hill with charge
    [InlineData("CC[NH3+]", "C2H8N+")]
    [InlineData("[O-]C(=O)C(=O)[O-]", "C2O4-2")]
    [InlineData("Cl", "ClH")] // no carbon: strictly alphabetical (Hill 1900)
    [InlineData("[Na+].[Cl-]", "ClNa")]
    [InlineData("[2H]C([2H])([2H])Cl", "CH3Cl")]
    public void Hill_Molecule_GivesHillOrder(string smiles, string hill)
    {
        Assert.Equal(hill, MolecularFormula.Of(SmilesReader.Read(smiles).Value!).Hill);
    }

    [Theory]
    [InlineData("Cn1cnc2c1c(=O)n(C)c(=O)n2C", 194.080376)] // Source: nmr-data-standards.md §7.3 worked example
    [InlineData("CCOC(C)=O", 88.052429)] // Source: same, ethyl acetate
    public void MonoisotopicMass_NeutralMolecule_MatchesWorkedExample(string smiles, double mass)
    {
        Assert.Equal(mass, MolecularFormula.Of(SmilesReader.Read(smiles).Value!).MonoisotopicMass, 6);
    }

    [Theory]
    [InlineData("C8H11N4O2+", 195.087652)] // caffeine [M+H]+, nmr-data-standards.md §7.3
    [InlineData("C8H10N4O2Na+", 217.069596)] // caffeine [M+Na]+, same
    [InlineData("C12H15NO3Na+", 244.094414)] // ACS-style example quoted in §7.3
    public void MonoisotopicMass_ParsedIon_SubtractsElectronMass(string formula, double mass)
    {
        var (parsed, error) = MolecularFormula.Parse(formula);
        Assert.Null(error);
        Assert.Equal(mass, parsed!.MonoisotopicMass, 6);
    }

    [Fact]
    public void AverageMass_Caffeine_UsesConventionalWeights()
    {
        // 8 × 12.011 + 10 × 1.008 + 4 × 14.007 + 2 × 15.999 (CIAAW conventional weights, §7.4)
        Assert.Equal(194.194, MolecularFormula.Of(SmilesReader.Read("Cn1cnc2c1c(=O)n(C)c(=O)n2C").Value!).AverageMass, 3);
    }

    [Fact]
    public void MonoisotopicMass_LabelledAtom_UsesNuclideMass()
    {
        // 13C: 13.00335483507 u (NIST); CH4 with one 13C vs natural CH4 differs by 1.003355 u.
        var labelled = MolecularFormula.Of(SmilesReader.Read("[13CH4]").Value!).MonoisotopicMass;
        var natural = MolecularFormula.Of(SmilesReader.Read("C").Value!).MonoisotopicMass;
        Assert.Equal(1.00335483507, labelled - natural, 9);
    }

    [Theory]
    [InlineData("C10H15NO2", "C10H15NO2", 0)]
    [InlineData("C2H7N+", "C2H7N+", 1)]
    [InlineData("C6H5O7-3", "C6H5O7-3", -3)]
    [InlineData("SO4-2", "O4S-2", -2)]
    public void Parse_WellFormed_GivesCountsAndCharge(string text, string hill, int charge)
    {
        var (parsed, error) = MolecularFormula.Parse(text);
        Assert.Null(error);
        Assert.Equal(hill, parsed!.Hill);
        Assert.Equal(charge, parsed.Charge);
    }

    [Theory]
    [InlineData("H+", 195.087652)] // caffeine [M+H]+, nmr-data-standards.md §7.3
    [InlineData("Na+", 217.069596)] // caffeine [M+Na]+, same
    public void Plus_Adduct_GivesPublishedIonMass(string adduct, double mass)
    {
        var m = MolecularFormula.Of(SmilesReader.Read("Cn1cnc2c1c(=O)n(C)c(=O)n2C").Value!);
        Assert.Equal(mass, m.Plus(MolecularFormula.Parse(adduct).Formula!).MonoisotopicMass, 6);
    }

    [Fact]
    public void WithCharge_RadicalCation_SubtractsOneElectron()
    {
        // M+• = M − me (nmr-data-standards.md §7.3).
        var m = MolecularFormula.Parse("C8H10N4O2").Formula!;
        Assert.Equal(m.MonoisotopicMass - MolecularFormula.ElectronMass, m.WithCharge(1).MonoisotopicMass, 9);
    }

    [Fact]
    public void Equals_ParsedAndComputedFormula_CompareByComposition()
    {
        var computed = MolecularFormula.Of(SmilesReader.Read("Cn1cnc2c1c(=O)n(C)c(=O)n2C").Value!);
        Assert.Equal(MolecularFormula.Parse("C8H10N4O2").Formula, computed);
        Assert.NotEqual(MolecularFormula.Parse("C8H11N4O2+").Formula, computed);
    }

    [Theory]
    [InlineData("C10Xx2")]
    [InlineData("C10H15)")]
    [InlineData("")]
    [InlineData("C2+3-")]
    public void Parse_Malformed_ReturnsError(string text)
    {
        var (parsed, error) = MolecularFormula.Parse(text);
        Assert.Null(parsed);
        Assert.False(string.IsNullOrEmpty(error));
    }
}
