namespace ConsistencyHost.Isolation;

/// <summary>
/// Counts worker losses per plugin in a sliding window; a plugin with <see cref="IsolationOptions.CrashLimit"/>
/// losses inside <see cref="IsolationOptions.CrashWindow"/> is quarantined until the oldest of them leaves the
/// window, so a plugin that crashes on every entry costs a few restarts, not one per request.
/// </summary>
/// <remarks>The policy follows VS Code's extension-host crash tracker (3 crashes within 5 minutes).</remarks>
internal sealed class CrashLedger(IsolationOptions options)
{
    private readonly Dictionary<string, Queue<(DateTimeOffset At, string Reason)>> _losses = new(StringComparer.Ordinal);
    private readonly Lock _lock = new();

    /// <summary>Records one loss (a crash or an overrun kill) of the plugin's worker.</summary>
    public void Record(string plugin, string reason)
    {
        lock (_lock)
        {
            if (!_losses.TryGetValue(plugin, out var queue))
            {
                _losses[plugin] = queue = new Queue<(DateTimeOffset, string)>();
            }

            queue.Enqueue((options.Clock.GetUtcNow(), reason));
            Prune(queue);
        }
    }

    /// <summary>Why the plugin is quarantined now, or null when it may run.</summary>
    public string? QuarantineReason(string plugin)
    {
        lock (_lock)
        {
            if (!_losses.TryGetValue(plugin, out var queue)) return null;
            Prune(queue);
            if (queue.Count < options.CrashLimit) return null;
            var until = queue.Peek().At + options.CrashWindow;
            return $"quarantined until {until:yyyy-MM-ddTHH:mm:ssZ}: its worker was lost {queue.Count} times within "
                   + $"{options.CrashWindow.TotalMinutes:0.#} min; last: {queue.Last().Reason}";
        }
    }

    private void Prune(Queue<(DateTimeOffset At, string Reason)> queue)
    {
        var horizon = options.Clock.GetUtcNow() - options.CrashWindow;
        while (queue.Count > 0 && queue.Peek().At <= horizon)
        {
            queue.Dequeue();
        }

        while (queue.Count > options.CrashLimit)
        {
            queue.Dequeue();
        }
    }
}
