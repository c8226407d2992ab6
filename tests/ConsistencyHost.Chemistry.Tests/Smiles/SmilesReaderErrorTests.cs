using ConsistencyHost.Chemistry.Reading;
using ConsistencyHost.Chemistry.Smiles;

namespace ConsistencyHost.Chemistry.Tests.Smiles;

/// <summary>Data table: malformed SMILES → the message and the character offset it points at.</summary>
public sealed class SmilesReaderErrorTests
{
    public static TheoryData<string, string, int> Rows => new()
    {
        { "", SmilesMessages.EmptyInput, 0 },
        { "C1CC", SmilesMessages.Format(SmilesMessages.UnclosedRing, 1), 1 },
        { "C(C", SmilesMessages.UnclosedBranch, 1 },
        { "CC)C", SmilesMessages.UnmatchedCloseBranch, 2 },
        { "()C", SmilesMessages.BranchWithoutAtom, 0 },
        { "C()C", SmilesMessages.EmptyBranch, 1 },
        // Branch grammar of the OpenSMILES specification (a branch holds a chain; a bond precedes its atom, from
        // memory of section 3.5); RDKit (python3-rdkit) refuses all three as well.
        { "C((C))C", SmilesMessages.BranchOpensBranch, 2 },
        { "C(((((C)))))", SmilesMessages.BranchOpensBranch, 2 },
        { "C=(C)C", SmilesMessages.Format(SmilesMessages.BondBeforeBranch, "="), 1 },
        { "C[Xx]", SmilesMessages.Format(SmilesMessages.UnknownElement, "Xx"), 2 },
        { "CQ", SmilesMessages.Format(SmilesMessages.UnknownElement, "Q"), 1 },
        { "C[CH4", SmilesMessages.UnclosedBracket, 1 },
        { "C[C+H]", SmilesMessages.Format(SmilesMessages.BadBracketContent, "H"), 4 },
        { "CC(C)(C)(C)C", SmilesMessages.Format(SmilesMessages.BadValence, 1, "C", 5, 4), 1 },
        { "c1cccc1", SmilesMessages.Format(SmilesMessages.KekuliseFailed, 0, "C"), 0 },
        { "C=", SmilesMessages.Format(SmilesMessages.DanglingBond, "="), 1 },
        { "=C", SmilesMessages.Format(SmilesMessages.BondWithoutAtom, "="), 0 },
        { "C11", SmilesMessages.Format(SmilesMessages.RingToSelf, 1), 2 },
        { "C12CC12", SmilesMessages.Format(SmilesMessages.DuplicateBond, 2), 6 },
        { "CC%1C", SmilesMessages.Format(SmilesMessages.UnexpectedCharacter, "%"), 2 },
        { "C=1CC-1", SmilesMessages.Format(SmilesMessages.RingBondConflict, 1), 6 },
        { "C=.C", SmilesMessages.BondBeforeDot, 2 },
    };

    [Theory]
    [MemberData(nameof(Rows))]
    public void Read_MalformedSmiles_ReportsMessageAtOffset(string smiles, string message, int offset)
    {
        var result = SmilesReader.Read(smiles);
        Assert.False(result.Succeeded);
        Assert.Null(result.Value);
        Assert.Contains(result.Problems, p => p.Severity == ProblemSeverity.Error && p.Message == message && p.Offset == offset);
    }

    [Fact]
    public void Read_LenientBadValence_IsWarningAndKeepsMolecule()
    {
        var result = SmilesReader.Read("CC(C)(C)(C)C", SmilesReadOptions.Lenient);
        Assert.True(result.Succeeded);
        Assert.Contains(result.Problems, p => p.Severity == ProblemSeverity.Warning && p.AtomIndex == 1);
    }

    [Fact]
    public void Read_ChiralityOnCh2_IsIgnoredWithWarning()
    {
        var result = SmilesReader.Read("[C@H2](F)Cl");
        Assert.True(result.Succeeded);
        Assert.Empty(result.Value!.TetrahedralStereo);
        Assert.Contains(result.Problems, p => p.Message == SmilesMessages.Format(SmilesMessages.ChiralityIgnored, 0, 4));
    }

    [Fact]
    public void Read_ConflictingDoubleBondMarks_WarningCarriesTheAtomOffset()
    {
        // Found by fuzzing (fuzz/run.sh smiles): the warning had an atom index but offset -1.
        // Source: OpenSMILES specification §3.7: '/' and '\' on two substituents of one double-bond atom
        // that put both on the same side are contradictory.
        var result = SmilesReader.Read(@"F/C(\F)=C/F");
        var problem = Assert.Single(result.Problems, p => p.Message == SmilesMessages.Format(SmilesMessages.ConflictingDoubleBondMarks, 1));
        Assert.Equal(ProblemSeverity.Warning, problem.Severity);
        Assert.Equal(2, problem.Offset);
        Assert.Equal(1, problem.AtomIndex);
    }
}
