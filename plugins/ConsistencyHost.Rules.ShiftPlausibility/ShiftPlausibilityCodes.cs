namespace ConsistencyHost.Rules.ShiftPlausibility;

/// <summary>The stable finding codes of the shift-plausibility rule.</summary>
public static class ShiftPlausibilityCodes
{
    /// <summary>A compound signal lies far outside the predicted window of every class (error by default).</summary>
    public const string SignalFarOutside = "signal-far-outside-windows";

    /// <summary>A compound signal lies just outside the predicted window of every class (warning by default).</summary>
    public const string SignalJustOutside = "signal-outside-windows";

    /// <summary>A signal fits some class's window but not the window of the classes the assignment gave it (info by default).</summary>
    public const string AssignedClassOutside = "assigned-class-outside-window";

    /// <summary>A non-exchangeable class has no reported signal inside its window (info by default: often an overlapped or unreported line).</summary>
    public const string ClassWithoutSignal = "class-without-plausible-signal";
}
