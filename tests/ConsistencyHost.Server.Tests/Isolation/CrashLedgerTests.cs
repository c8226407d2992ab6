using ConsistencyHost.Isolation;

namespace ConsistencyHost.Server.Tests.Isolation;

public sealed class CrashLedgerTests
{
    private const string Plugin = "/plugins/Lab.Rules/Lab.Rules.dll";

    /// <summary>A clock the test moves by hand: the window is checked without waiting.</summary>
    private sealed class ManualClock : TimeProvider
    {
        public DateTimeOffset Now { get; set; } = new(2026, 3, 14, 9, 0, 0, TimeSpan.Zero);

        public override DateTimeOffset GetUtcNow() => Now;
    }

    private static (CrashLedger Ledger, ManualClock Clock) Ledger()
    {
        var clock = new ManualClock();
        return (new CrashLedger(new IsolationOptions { CrashLimit = 3, CrashWindow = TimeSpan.FromMinutes(5), Clock = clock }), clock);
    }

    [Fact]
    public void QuarantineReason_FewerLossesThanLimit_IsNull()
    {
        var (ledger, clock) = Ledger();
        ledger.Record(Plugin, "first");
        clock.Now += TimeSpan.FromMinutes(1);
        ledger.Record(Plugin, "second");

        Assert.Null(ledger.QuarantineReason(Plugin));
    }

    [Fact]
    public void QuarantineReason_LimitReachedInsideWindow_NamesEndAndLastLoss()
    {
        var (ledger, clock) = Ledger();
        ledger.Record(Plugin, "first");
        clock.Now += TimeSpan.FromMinutes(1);
        ledger.Record(Plugin, "second");
        clock.Now += TimeSpan.FromMinutes(1);
        ledger.Record(Plugin, "Stack overflow.");

        var reason = ledger.QuarantineReason(Plugin);

        Assert.NotNull(reason);
        // Released five minutes after the oldest loss that still counts (09:00).
        Assert.StartsWith("quarantined until 2026-03-14T09:05:00Z", reason, StringComparison.Ordinal);
        Assert.EndsWith("last: Stack overflow.", reason, StringComparison.Ordinal);
        Assert.Null(ledger.QuarantineReason("/plugins/Other/Other.dll"));
    }

    [Fact]
    public void QuarantineReason_OldestLossLeavesWindow_IsReleased()
    {
        var (ledger, clock) = Ledger();
        ledger.Record(Plugin, "first");
        clock.Now += TimeSpan.FromMinutes(2);
        ledger.Record(Plugin, "second");
        ledger.Record(Plugin, "third");
        clock.Now += TimeSpan.FromMinutes(3);

        Assert.Null(ledger.QuarantineReason(Plugin));
    }
}
