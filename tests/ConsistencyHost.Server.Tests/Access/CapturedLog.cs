using System.Collections.Concurrent;
using Microsoft.Extensions.Logging;

namespace ConsistencyHost.Server.Tests.Access;

/// <summary>Every log line the host writes, from every category, as text and as structured fields.</summary>
public sealed class CapturedLog : ILoggerProvider
{
    private readonly ConcurrentQueue<Line> _lines = new();

    public sealed record Line(string Category, int EventId, LogLevel Level, string Text, IReadOnlyDictionary<string, object?> Fields);

    public IReadOnlyList<Line> Lines => [.. _lines];

    /// <summary>Everything logged, messages, field values and exceptions, as one text.</summary>
    public string AllText => string.Join('\n', _lines.Select(l => l.Text + " " + string.Join(' ', l.Fields.Values)));

    public ILogger CreateLogger(string categoryName) => new Logger(categoryName, _lines);

    public void Dispose()
    {
    }

    private sealed class Logger(string category, ConcurrentQueue<Line> lines) : ILogger
    {
        public IDisposable? BeginScope<TState>(TState state) where TState : notnull => null;

        public bool IsEnabled(LogLevel logLevel) => true;

        public void Log<TState>(LogLevel logLevel, EventId eventId, TState state, Exception? exception, Func<TState, Exception?, string> formatter)
        {
            var fields = (state as IReadOnlyList<KeyValuePair<string, object?>> ?? []).ToDictionary(p => p.Key, p => p.Value);
            lines.Enqueue(new Line(category, eventId.Id, logLevel, formatter(state, exception) + (exception is null ? "" : " " + exception), fields));
        }
    }
}
