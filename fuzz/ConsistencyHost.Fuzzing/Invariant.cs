namespace ConsistencyHost.Fuzzing;

/// <summary>A consistency property the harness checks after a read; a failure is reported as a crash.</summary>
internal static class Invariant
{
    public static void Require(bool condition, string what)
    {
        if (!condition)
        {
            throw new InvariantViolationException(what);
        }
    }
}

/// <summary>Thrown by the harness (never by a reader) when a read result breaks a stated property.</summary>
internal sealed class InvariantViolationException(string message) : Exception(message);
