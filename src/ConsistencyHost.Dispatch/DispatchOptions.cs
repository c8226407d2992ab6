namespace ConsistencyHost.Dispatch;

/// <summary>How <see cref="ReplicaDispatcher"/> spreads entries over replicas and recovers from a lost one.</summary>
public sealed record DispatchOptions
{
    /// <summary>Defaults: 32 in flight per replica, 4 sends per entry, 0.2 s to 5 s back-off, a replica given up after 5 failures in a row.</summary>
    public static DispatchOptions Default { get; } = new();

    /// <summary>Entries sent on one replica's stream and not yet answered; bounds memory and a lost replica's share.</summary>
    public int MaxInFlightPerReplica { get; init; } = 32;

    /// <summary>Sends of one entry, the first included; an entry unanswered after this many fails the dispatch.</summary>
    public int MaxAttempts { get; init; } = 4;

    /// <summary>Wait before a resubmitted entry is sent again and before a down replica is probed; doubles per failure.</summary>
    public TimeSpan InitialBackoff { get; init; } = TimeSpan.FromMilliseconds(200);

    /// <summary>Longest back-off.</summary>
    public TimeSpan MaxBackoff { get; init; } = TimeSpan.FromSeconds(5);

    /// <summary>Failed streams and probes in a row after which a replica is given up for the rest of the dispatch.</summary>
    public int MaxReplicaFailures { get; init; } = 5;

    /// <summary>Deadline of the probe (a <c>ListRules</c> call) that tells whether a down replica is back.</summary>
    public TimeSpan ProbeTimeout { get; init; } = TimeSpan.FromSeconds(5);

    /// <summary>The clock for back-off and the summary's elapsed time (tests may pass their own).</summary>
    public TimeProvider TimeProvider { get; init; } = TimeProvider.System;

    /// <summary>The back-off after <paramref name="failures"/> failures in a row (1 = the first): doubling, capped.</summary>
    public TimeSpan Backoff(int failures)
    {
        var factor = Math.Pow(2, Math.Clamp(failures - 1, 0, 30));
        return TimeSpan.FromTicks((long)Math.Min(InitialBackoff.Ticks * factor, MaxBackoff.Ticks));
    }

    /// <summary>Throws <see cref="ArgumentOutOfRangeException"/> naming the first setting out of range.</summary>
    public void Validate()
    {
        Positive(MaxInFlightPerReplica, nameof(MaxInFlightPerReplica));
        Positive(MaxAttempts, nameof(MaxAttempts));
        Positive(MaxReplicaFailures, nameof(MaxReplicaFailures));
        if (InitialBackoff < TimeSpan.Zero || MaxBackoff < InitialBackoff)
        {
            throw new ArgumentOutOfRangeException(nameof(MaxBackoff), $"back-off must satisfy 0 <= {nameof(InitialBackoff)} ({InitialBackoff}) <= {nameof(MaxBackoff)} ({MaxBackoff})");
        }

        if (ProbeTimeout <= TimeSpan.Zero) throw new ArgumentOutOfRangeException(nameof(ProbeTimeout), ProbeTimeout, "must be positive");
    }

    private static void Positive(int value, string name)
    {
        if (value < 1) throw new ArgumentOutOfRangeException(name, value, "must be at least 1");
    }
}
