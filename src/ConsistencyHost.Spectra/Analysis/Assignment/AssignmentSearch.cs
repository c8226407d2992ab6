namespace ConsistencyHost.Spectra.Analysis.Assignment;

/// <summary>The branch-and-bound state of one <see cref="AssignmentSolver"/> call.</summary>
internal sealed class AssignmentSearch
{
    private readonly IReadOnlyList<ClassInput> _classes;
    private readonly IReadOnlyList<SignalInput> _signals;
    private readonly AssignmentOptions _options;
    private readonly int[] _order;          // class indices, largest first
    private readonly int[] _choice;         // per class: signal index, or Missing
    private readonly int[] _filled;         // per signal: protons assigned so far
    private readonly int[] _members;        // per signal: number of classes assigned
    private readonly double[] _pattern;     // per signal: worst pattern cost among its classes
    private readonly int[] _remainingAfter; // protons of classes at order positions >= i
    private readonly double[,] _patternCost; // per class and signal, computed once
    private readonly double[,]? _shiftCost;  // per class and signal: how poorly the predicted shift fits (search order only)
    private readonly bool[,] _identical;      // per signal pair: same count, pattern and shift fit for every class
    private readonly int[][] _candidates;    // per order position: reusable candidate buffer (signals + Missing)
    private int[]? _bestChoice;
    private double _bestCost;
    private long _nodes;

    private int Missing => _signals.Count;

    /// <param name="classes">The classes.</param>
    /// <param name="signals">The signals.</param>
    /// <param name="options">Weights and budget.</param>
    /// <param name="upperBound">Only assignments cheaper than this are of interest (a better one is known elsewhere).</param>
    /// <param name="shiftCost">Optional per class and signal shift misfit: among equally cheap signals, the better fit is tried first.</param>
    public AssignmentSearch(IReadOnlyList<ClassInput> classes, IReadOnlyList<SignalInput> signals, AssignmentOptions options, double upperBound, double[,]? shiftCost = null)
    {
        _shiftCost = shiftCost;
        _classes = classes;
        _signals = signals;
        _options = options;
        _bestCost = upperBound;
        _patternCost = new double[classes.Count, signals.Count];
        for (var c = 0; c < classes.Count; c++)
        {
            for (var s = 0; s < signals.Count; s++) _patternCost[c, s] = PatternCost.Of(classes[c], signals[s], options);
        }

        _identical = Identical(signals, shiftCost, classes.Count);
        _candidates = [.. Enumerable.Range(0, classes.Count).Select(_ => new int[signals.Count + 1])];
        // Largest first; interchangeable classes next to each other so that their ordering constraint applies (the
        // later of two takes a signal no earlier than the former's), and among them the one whose shift fits an
        // earlier signal first, so that the constraint agrees with the shifts.
        _order = [.. Enumerable.Range(0, classes.Count)
            .OrderByDescending(i => classes[i].Size).ThenBy(i => classes[i].IsExchangeable)
            .ThenBy(i => classes[i].TypicalCoupledProtons).ThenBy(i => classes[i].MaxCoupledProtons).ThenBy(BestSignal).ThenBy(i => i)];
        _choice = new int[classes.Count];
        _filled = new int[signals.Count];
        _members = new int[signals.Count];
        _pattern = new double[signals.Count];
        _remainingAfter = new int[classes.Count + 1];
        for (var i = classes.Count - 1; i >= 0; i--)
        {
            _remainingAfter[i] = _remainingAfter[i + 1] + classes[_order[i]].Size;
        }
    }

    public AssignmentResult Run()
    {
        Visit(0, 0);
        return Result();
    }

    private void Visit(int position, double costSoFar)
    {
        if (++_nodes > _options.NodeBudget || costSoFar + LowerBound(position) >= _bestCost)
        {
            return;
        }

        if (position == _order.Length)
        {
            _bestCost = costSoFar + Underflow();
            _bestChoice = (int[])_choice.Clone();
            return;
        }

        var current = _order[position];
        var buffer = _candidates[position];
        var count = Candidates(position, buffer);
        for (var k = 0; k < count; k++)
        {
            var signal = buffer[k];
            _choice[current] = signal;
            if (signal == Missing)
            {
                Visit(position + 1, costSoFar + MissingCost(current));
                continue;
            }

            var savedPattern = _pattern[signal];
            var step = Place(current, signal);
            Visit(position + 1, costSoFar + step);
            Unplace(current, signal, savedPattern);
        }
    }

    /// <summary>
    /// Fills <paramref name="buffer"/> with the signals worth trying for the class at <paramref name="position"/>,
    /// most promising first: signals it fits in (cheapest pattern first), then Missing, then signals it would
    /// overflow. Returns how many were written. No allocation: the search visits up to the node budget.
    /// </summary>
    private int Candidates(int position, int[] buffer)
    {
        var current = _order[position];
        var size = _classes[current].Size;
        var floor = position > 0 && SameKind(_order[position - 1], current) ? _choice[_order[position - 1]] : 0;
        var fitting = 0;
        for (var s = floor; s < _signals.Count; s++)
        {
            if (_filled[s] + size > _signals[s].ProtonCount || (_members[s] == 0 && HasIdenticalEarlierEmpty(s, floor))) continue;
            var at = fitting++;
            while (at > 0 && TriedLater(current, buffer[at - 1], s))
            {
                buffer[at] = buffer[at - 1];
                at--;
            }

            buffer[at] = s;
        }

        var count = fitting;
        buffer[count++] = Missing;
        for (var s = floor; s < _signals.Count; s++)
        {
            if (_filled[s] + size > _signals[s].ProtonCount && !(_members[s] == 0 && HasIdenticalEarlierEmpty(s, floor))) buffer[count++] = s;
        }

        return count;
    }

    /// <summary>
    /// Which signals are the same to the search: equal count and pattern and, with shifts, equal fit for every class
    /// (two 2 H doublets at different shifts are not interchangeable once shifts order the search).
    /// </summary>
    private static bool[,] Identical(IReadOnlyList<SignalInput> signals, double[,]? shiftCost, int classCount)
    {
        var identical = new bool[signals.Count, signals.Count];
        for (var a = 0; a < signals.Count; a++)
        {
            for (var b = 0; b < signals.Count; b++)
            {
                var same = signals[a] == signals[b];
                for (var c = 0; same && shiftCost is not null && c < classCount; c++) same = shiftCost[c, a] == shiftCost[c, b];
                identical[a, b] = same;
            }
        }

        return identical;
    }

    /// <summary>True when signal <paramref name="placed"/> should come after <paramref name="candidate"/>: a worse pattern, or an equal one and a worse shift.</summary>
    private bool TriedLater(int current, int placed, int candidate)
    {
        var (a, b) = (_patternCost[current, placed], _patternCost[current, candidate]);
        if (a != b) return a > b;
        return _shiftCost is not null && _shiftCost[current, placed] > _shiftCost[current, candidate];
    }

    /// <summary>The signal the class's predicted shift fits best (0 without shifts).</summary>
    private int BestSignal(int cls)
    {
        if (_shiftCost is null) return 0;
        var best = 0;
        for (var s = 1; s < _signals.Count; s++)
        {
            if (_shiftCost[cls, s] < _shiftCost[cls, best]) best = s;
        }

        return best;
    }

    private bool HasIdenticalEarlierEmpty(int signal, int floor)
    {
        for (var s = floor; s < signal; s++)
        {
            if (_members[s] == 0 && _identical[s, signal]) return true;
        }

        return false;
    }

    private bool SameKind(int a, int b) => _classes[a].IsInterchangeableWith(_classes[b]);

    private double MissingCost(int current) => _classes[current].IsExchangeable ? 0 : _options.MissingClassCost;

    /// <summary>Adds a class to a signal and returns the cost it adds (overflow and a worse pattern).</summary>
    private double Place(int current, int signal)
    {
        var before = Overflow(signal) + _pattern[signal];
        _filled[signal] += _classes[current].Size;
        _members[signal]++;
        _pattern[signal] = Math.Max(_pattern[signal], _patternCost[current, signal]);
        return Overflow(signal) + _pattern[signal] - before;
    }

    private void Unplace(int current, int signal, double savedPattern)
    {
        _filled[signal] -= _classes[current].Size;
        _members[signal]--;
        _pattern[signal] = savedPattern;
    }

    private double Overflow(int signal) => Math.Max(0, _filled[signal] - _signals[signal].ProtonCount) * _options.CountMismatchCost;

    /// <summary>Protons still missing from signals that remaining classes cannot all supply.</summary>
    private double LowerBound(int position)
    {
        var deficit = 0;
        for (var s = 0; s < _signals.Count; s++) deficit += Math.Max(0, _signals[s].ProtonCount - _filled[s]);
        return Math.Max(0, deficit - _remainingAfter[position]) * _options.CountMismatchCost;
    }

    private double Underflow()
    {
        var deficit = 0;
        for (var s = 0; s < _signals.Count; s++) deficit += Math.Max(0, _signals[s].ProtonCount - _filled[s]);
        return deficit * _options.CountMismatchCost;
    }

    private AssignmentResult Result()
    {
        var bySignal = new List<int>[_signals.Count];
        for (var s = 0; s < bySignal.Length; s++) bySignal[s] = [];
        var missing = new List<int>();
        for (var c = 0; c < _classes.Count; c++)
        {
            var signal = _bestChoice?[c] ?? Missing;
            if (signal == Missing) missing.Add(c);
            else bySignal[signal].Add(c);
        }

        var cost = _bestChoice is null ? double.PositiveInfinity : _bestCost;
        var consistent = _bestChoice is not null && IsConsistent(bySignal, missing);
        return new AssignmentResult(bySignal, missing, cost, consistent, _nodes <= _options.NodeBudget);
    }

    private bool IsConsistent(List<int>[] bySignal, List<int> missing)
    {
        foreach (var c in missing)
        {
            if (!_classes[c].IsExchangeable) return false;
        }

        for (var s = 0; s < bySignal.Length; s++)
        {
            var protons = 0;
            foreach (var c in bySignal[s])
            {
                protons += _classes[c].Size;
                if (_patternCost[c, s] >= _options.ImpossiblePatternCost) return false;
            }

            if (protons != _signals[s].ProtonCount) return false;
        }

        return true;
    }
}
