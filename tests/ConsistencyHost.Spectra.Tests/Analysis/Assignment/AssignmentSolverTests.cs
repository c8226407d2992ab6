using ConsistencyHost.Spectra.Analysis.Assignment;

namespace ConsistencyHost.Spectra.Tests.Analysis.Assignment;

/// <summary>
/// The solver on hand-built class lists. Coupled-proton counts follow the first-order n+1 rule
/// (common practice); the 1H data of ethyl 4-aminobenzoate are typical literature values, from memory.
/// </summary>
public sealed class AssignmentSolverTests
{
    // Ethyl 4-aminobenzoate: ArH (2, ortho to CO2Et), ArH (2, ortho to NH2), OCH2 (2), CH3 (3), NH2 (2).
    private static readonly ClassInput[] Benzocaine =
    [
        new(2, false, 2, 2),
        new(2, false, 2, 2),
        new(2, false, 3, 3),
        new(3, false, 2, 2),
        new(2, true, 0, 0),
    ];

    [Fact]
    public void Solve_BenzocaineAsReported_IsConsistentAndPlacesMethylInTriplet()
    {
        SignalInput[] signals = [new(2, 1), new(2, 1), new(2, 3), new(2, 0), new(3, 2)];

        var result = AssignmentSolver.Solve(Benzocaine, signals);

        Assert.True(result.IsConsistent);
        Assert.Equal(0, result.Cost);
        Assert.Equal([3], result.ClassesBySignal[4]);
        Assert.Empty(result.MissingClasses);
    }

    [Fact]
    public void Solve_ExchangeableProtonsNotReported_StaysConsistent()
    {
        SignalInput[] signals = [new(2, 1), new(2, 1), new(2, 3), new(3, 2)];

        var result = AssignmentSolver.Solve(Benzocaine, signals);

        Assert.True(result.IsConsistent);
        Assert.Equal([4], result.MissingClasses);
    }

    [Fact]
    public void Solve_MethylReportedAsQuartet_NoConsistentAssignment()
    {
        // Swapped multiplicities: the CH3 (two neighbours) cannot be a quartet; the CH2 could be a triplet only
        // with two partners, but it has three. Counts still force CH3 into the 3H signal.
        SignalInput[] signals = [new(2, 1), new(2, 1), new(2, 2), new(2, 0), new(3, 3)];

        var result = AssignmentSolver.Solve(Benzocaine, signals);

        Assert.False(result.IsConsistent);
        Assert.True(result.Cost >= AssignmentOptions.Default.ImpossiblePatternCost);
    }

    [Fact]
    public void Solve_IntegralsTooHigh_CountMismatchIsCosted()
    {
        SignalInput[] signals = [new(2, 1), new(2, 1), new(2, 3), new(2, 0), new(4, 2)];

        var result = AssignmentSolver.Solve(Benzocaine, signals);

        Assert.False(result.IsConsistent);
        Assert.Equal(AssignmentOptions.Default.CountMismatchCost, result.Cost);
    }

    [Fact]
    public void Solve_OverlappedMultipletHoldsSeveralClasses()
    {
        // Monosubstituted phenyl (ortho 2H, meta 2H, para 1H) reported as one "m, 5H"; plus a CH3 singlet.
        ClassInput[] classes = [new(2, false, 2, 3), new(2, false, 3, 3), new(1, false, 2, 4), new(3, false, 0, 0)];
        SignalInput[] signals = [new(5, null), new(3, 0)];

        var result = AssignmentSolver.Solve(classes, signals);

        Assert.True(result.IsConsistent);
        Assert.Equal([0, 1, 2], result.ClassesBySignal[0]);
    }

    [Fact]
    public void Solve_ThirtyIdenticalMethines_FinishesExhaustivelyThroughSymmetryBreaking()
    {
        var classes = Enumerable.Repeat(new ClassInput(1, false, 2, 2), 30).ToArray();
        var signals = Enumerable.Repeat(new SignalInput(1, null), 30).ToArray();

        var result = AssignmentSolver.Solve(classes, signals);

        Assert.True(result.IsConsistent);
        Assert.True(result.IsExhaustive);
    }
}
