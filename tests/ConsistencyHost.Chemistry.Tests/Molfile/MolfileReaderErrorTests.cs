using ConsistencyHost.Chemistry.Molfile;
using ConsistencyHost.Chemistry.Reading;

namespace ConsistencyHost.Chemistry.Tests.Molfile;

/// <summary>Data table: malformed molfiles → message, line and column (CTfile V2000/V3000 layout).</summary>
public sealed class MolfileReaderErrorTests
{
    private const string Header = "name\n  program\n\n";
    private const string AtomC = "    0.0000    0.0000    0.0000 C   0  0  0  0  0  0  0  0  0  0  0  0\n";
    private const string AtomCl = "    1.5000    0.0000    0.0000 Cl  0  0  0  0  0  0  0  0  0  0  0  0\n";

    public static TheoryData<string, string, int, int> Rows => new()
    {
        { "only one line", MolfileMessages.Format(MolfileMessages.TooShort, 1), 1, 0 },
        { Header + "abc\nM  END\n", MolfileMessages.BadCountsLine, 4, 1 },
        { Header + "  1  0  0  0  0  0  0  0  0  0999 V4000\nM  END\n", MolfileMessages.Format(MolfileMessages.UnknownVersion, "V4000"), 4, 34 },
        { Header + "  1  0  0  0  0  0  0  0  0  0999 V2000\n    0.0000    0.0000    0.0000 Xx  0  0\nM  END\n", MolfileMessages.Format(MolfileMessages.UnknownElement, "Xx"), 5, 32 },
        { Header + "  1  0  0  0  0  0  0  0  0  0999 V2000\n    0.0x00    0.0000    0.0000 C   0  0\nM  END\n", MolfileMessages.Format(MolfileMessages.BadNumber, "x", "0.0x00"), 5, 1 },
        // Found by fuzzing (fuzz/run.sh sdf): an overflowing exponent was read as an infinite coordinate.
        { Header + "  1  0  0  0  0  0  0  0  0  0999 V2000\n    0.0000   1E3372    0.0000 C   0  0\nM  END\n", MolfileMessages.Format(MolfileMessages.BadNumber, "y", "1E3372"), 5, 11 },
        // Found by fuzzing (fuzz/run-all-short.sh, sdf): MASS=229300090 was kept and written as a SMILES isotope
        // that no reader takes. Source: CTfile formats (BIOVIA): M  CHG takes -15 to +15 (from memory).
        { Header + "  0  0  0  0  0  0  0  0  0  0999 V3000\nM  V30 BEGIN CTAB\nM  V30 COUNTS 1 0 0 0 0\nM  V30 BEGIN ATOM\nM  V30 1 C 0 0 0 0 MASS=229300090\nM  V30 END ATOM\nM  V30 END CTAB\nM  END\n", MolfileMessages.Format(MolfileMessages.BadMassNumber, 229300090), 8, 1 },
        // Found by fuzzing (fuzz/run.sh molfile): an undeclared negative atom id was shifted into range and
        // the bond indexed atom -2. Source: CTfile formats (BIOVIA), V3000 bond line 'index type atom1 atom2'.
        { Header + "  0  0  0  0  0  0  0  0  0  0999 V3000\nM  V30 BEGIN CTAB\nM  V30 COUNTS 2 1 0 0 0\nM  V30 BEGIN ATOM\nM  V30 1 C 0 0 0 0\nM  V30 2 C 1.5 0 0 0\nM  V30 END ATOM\nM  V30 BEGIN BOND\nM  V30 1 1 1 -1\nM  V30 END BOND\nM  V30 END CTAB\nM  END\n", MolfileMessages.Format(MolfileMessages.BadAtomReference, -1, 2), 12, 1 },
        { Header + "  1  0  0  0  0  0  0  0  0  0999 V2000\n" + AtomC + "M  CHG  1   1  16\nM  END\n", MolfileMessages.Format(MolfileMessages.BadCharge, 16), 6, 14 },
        { Header + "  2  1  0  0  0  0  0  0  0  0999 V2000\n" + AtomC + AtomCl + "  1  9  1  0\nM  END\n", MolfileMessages.Format(MolfileMessages.BadAtomReference, 9, 2), 7, 1 },
        { Header + "  2  1  0  0  0  0  0  0  0  0999 V2000\n" + AtomC + AtomCl + "  1  1  1  0\nM  END\n", MolfileMessages.Format(MolfileMessages.SelfBond, 1), 7, 1 },
        { Header + "  3  0  0  0  0  0  0  0  0  0999 V2000\n" + AtomC + AtomCl, MolfileMessages.Format(MolfileMessages.MissingAtomLine, 3, 3), 6, 1 },
        { Header + "  2  1  0  0  0  0  0  0  0  0999 V2000\n" + AtomC + AtomCl + "  1  2  1  0\nM  CHG  2   1   1\nM  END\n", MolfileMessages.Format(MolfileMessages.BadPropertyLine, "M  CHG  2   1   1"), 8, 7 },
        { Header + "  0  0  0  0  0  0  0  0  0  0999 V3000\nM  V30 BEGIN CTAB\nM  V30 BEGIN ATOM\nM  V30 1 C zero 0 0 0\nM  V30 END ATOM\nM  V30 END CTAB\nM  END\n", MolfileMessages.Format(MolfileMessages.BadV3000Line, "expected 'index type x y z aamap' for an atom"), 7, 1 },
    };

    [Fact]
    public void Read_TwoBondLinesForOneAtomPair_ReportsDuplicateBondAtTheSecondLine()
    {
        // Found by fuzzing (fuzz/run.sh molfile): a repeated pair was read as a multigraph, which the SMILES
        // writer then wrote as a ring bond duplicating a chain bond. Source: CTfile formats (BIOVIA), V2000 bond
        // block: one line per bond between two atoms; the SMILES reader rejects the same duplicate (OpenSMILES, ring bonds).
        var text = Header + "  2  2  0  0  0  0  0  0  0  0999 V2000\n" + AtomC + AtomCl + "  1  2  1  0\n  2  1  1  0\nM  END\n";
        var result = MolfileReader.Read(text);
        Assert.Null(result.Value);
        var problem = Assert.Single(result.Problems);
        Assert.Equal((ProblemSeverity.Error, MolfileMessages.Format(MolfileMessages.DuplicateBond, 1, 2, 7), 8, 1), (problem.Severity, problem.Message, problem.Line, problem.Column));
    }

    [Theory]
    [MemberData(nameof(Rows))]
    public void Read_MalformedMolfile_ReportsMessageAtLineAndColumn(string text, string message, int line, int column)
    {
        var result = MolfileReader.Read(text);
        Assert.False(result.Succeeded);
        Assert.Contains(result.Problems, p => p.Severity == ProblemSeverity.Error && p.Message == message && p.Line == line && p.Column == column);
    }

    [Fact]
    public void Read_ChargeAndIsotopeProperties_SupersedeAtomBlock()
    {
        // CTfile: M  CHG replaces atom-block charges; M  ISO sets the mass number. [13CH3]-[NH3+] (methylammonium).
        var text = Header + "  2  1  0  0  0  0  0  0  0  0999 V2000\n" + AtomC
            + "    1.5000    0.0000    0.0000 N   0  0  0  0  0  0  0  0  0  0  0  0\n  1  2  1  0\nM  CHG  1   2   1\nM  ISO  1   1  13\nM  END\n";
        var m = MolfileReader.Read(text).Value!;
        Assert.Equal((13, 3), (m.Atoms[0].Isotope, m.Atoms[0].HydrogenCount));
        Assert.Equal((1, 3), (m.Atoms[1].Charge, m.Atoms[1].HydrogenCount));
    }
}
