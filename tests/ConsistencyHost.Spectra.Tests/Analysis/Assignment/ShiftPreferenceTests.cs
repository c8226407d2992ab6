using ConsistencyHost.Spectra.Analysis.Assignment;

namespace ConsistencyHost.Spectra.Tests.Analysis.Assignment;

/// <summary>
/// The solver's preference, among assignments equal on counts and patterns, for the one whose shifts fit.
/// Class inputs follow the first-order n+1 rule (common practice); shift misfits are given by hand (ppm).
/// </summary>
public sealed class ShiftPreferenceTests
{
    // Ethyl 4-aminobenzoate: ArH ortho to CO2Et (2), ArH ortho to NH2 (2): the same to the solver.
    private static readonly ClassInput[] TwoAromaticPairs = [new(2, false, 1, 1), new(2, false, 1, 1)];
    private static readonly SignalInput[] TwoDoublets = [new(2, 1), new(2, 1)];

    [Fact]
    public void Refine_LookAlikesInTheWrongOrder_SwapsThem()
    {
        var solved = AssignmentSolver.Solve(TwoAromaticPairs, TwoDoublets);
        var first = solved.ClassesBySignal[0][0];
        // The class the solver put first fits the second signal, and the other the first.
        double Misfit(int c, int s) => (c == first) == (s == 0) ? 1.0 : 0.0;

        var refined = ShiftPreference.Refine(TwoAromaticPairs, TwoDoublets, solved, Misfit);

        Assert.Equal([1 - first], refined.ClassesBySignal[0]);
        Assert.Equal([first], refined.ClassesBySignal[1]);
        Assert.Equal(solved.Cost, refined.Cost);
    }

    [Fact]
    public void Refine_ShiftsAlreadyFit_KeepsTheSolversAnswer()
    {
        var solved = AssignmentSolver.Solve(TwoAromaticPairs, TwoDoublets);
        var first = solved.ClassesBySignal[0][0];

        var refined = ShiftPreference.Refine(TwoAromaticPairs, TwoDoublets, solved, (c, s) => (c == first) == (s == 0) ? 0.0 : 1.0);

        Assert.Same(solved, refined);
    }

    [Fact]
    public void Refine_SwapThatWouldBreakAPattern_NotMade()
    {
        // A CH2 next to a CH3 (3 partners) and an aromatic pair (1 partner), reported as a q and a d: the shifts
        // say swap, but the q is impossible for the aromatic pair, so the solver's cost forbids it.
        ClassInput[] classes = [new(2, false, 3, 3), new(2, false, 1, 1)];
        SignalInput[] signals = [new(2, 3), new(2, 1)];
        var solved = AssignmentSolver.Solve(classes, signals);
        Assert.Equal([0], solved.ClassesBySignal[0]);

        var refined = ShiftPreference.Refine(classes, signals, solved, (c, s) => c == s ? 5.0 : 0.0);

        Assert.Equal([0], refined.ClassesBySignal[0]);
    }

    [Fact]
    public void Solve_WithShifts_PlacesTheBestFittingClassFirst()
    {
        // A benzylic CH2 (2 H) and two vinyl CH (1 H each) against two 2 H doublets, the first at low field: counts
        // and patterns allow the CH2 in either; without shifts the search takes the first signal, with them the
        // CH2 goes to the high-field doublet and the vinyl pair to the low-field one.
        ClassInput[] classes = [new(2, false, 1, 3), new(1, false, 1, 5), new(1, false, 1, 5)];
        SignalInput[] signals = [new(2, 1), new(2, 1)];
        var misfit = new double[,] { { 3, 0 }, { 0.1, 3 }, { 0.1, 3 } };

        var blind = AssignmentSolver.Solve(classes, signals);
        var informed = AssignmentSolver.Solve(classes, signals, null, double.PositiveInfinity, misfit);

        Assert.Equal([0], blind.ClassesBySignal[0]);
        Assert.True(informed.IsConsistent);
        Assert.Equal([0], informed.ClassesBySignal[1]);
        Assert.Equal([1, 2], informed.ClassesBySignal[0]);
    }
}
