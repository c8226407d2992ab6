using System.Collections.Concurrent;
using ConsistencyHost.Contract.V1;
using ConsistencyHost.Engine;
using ConsistencyHost.Server.Services;
using ConsistencyHost.Tests.Shared;
using Grpc.Core;
using Microsoft.Extensions.Logging;

namespace ConsistencyHost.Server.Tests.EndToEnd;

/// <summary>The check service's structured log: entry id, rule and timing as fields, stable event ids.</summary>
public sealed class CheckLogTests
{
    [Fact]
    public async Task CheckEntry_LogsEntryAndEachRuleWithStructuredFields()
    {
        using var plugins = PluginFolder.With("ConsistencyHost.Rules.SpectrumMetadata");
        var log = new CollectingLogger();
        var service = new EntryCheckService(new CheckEngine(new EngineOptions { PluginsPath = plugins.Path }), new StreamInFlight(1), log);

        await service.CheckEntry(Requests.MissingSolvent("AIS-LQ-L001"), new MinimalCallContext());

        var rule = Assert.Single(log.Entries, e => e.EventId == 1101);
        Assert.Equal("AIS-LQ-L001", rule.Fields["EntryId"]);
        Assert.Equal("spectrum-metadata", rule.Fields["RuleId"]);
        Assert.IsType<double>(rule.Fields["ElapsedMs"]);
        var entry = Assert.Single(log.Entries, e => e.EventId == 1100);
        Assert.Equal(1, entry.Fields["FindingCount"]);
        Assert.Equal("default", entry.Fields["Profile"]);
    }

    [Fact]
    public async Task CheckEntry_UnusableEntry_LogsFieldPath()
    {
        using var plugins = PluginFolder.With("ConsistencyHost.Rules.SpectrumMetadata");
        var log = new CollectingLogger();
        var service = new EntryCheckService(new CheckEngine(new EngineOptions { PluginsPath = plugins.Path }), new StreamInFlight(1), log);

        await Assert.ThrowsAsync<ConsistencyHost.Engine.Intake.EntryInputException>(() => service.CheckEntry(Requests.UnknownNucleus("AIS-LQ-L002"), new MinimalCallContext()));

        var refused = Assert.Single(log.Entries, e => e.EventId == 1103);
        Assert.Equal("spectra[0].nucleus", refused.Fields["Field"]);
    }

    private sealed record LogEntry(int EventId, IReadOnlyDictionary<string, object?> Fields);

    private sealed class CollectingLogger : ILogger<EntryCheckService>
    {
        private readonly ConcurrentQueue<LogEntry> _entries = new();

        public IReadOnlyList<LogEntry> Entries => [.. _entries];

        public IDisposable? BeginScope<TState>(TState state) where TState : notnull => null;

        public bool IsEnabled(LogLevel logLevel) => true;

        public void Log<TState>(LogLevel logLevel, EventId eventId, TState state, Exception? exception, Func<TState, Exception?, string> formatter)
        {
            var fields = state as IReadOnlyList<KeyValuePair<string, object?>> ?? [];
            _entries.Enqueue(new LogEntry(eventId.Id, fields.ToDictionary(p => p.Key, p => p.Value)));
        }
    }

    private sealed class MinimalCallContext : ServerCallContext
    {
        protected override string MethodCore => "/consistencyhost.v1.EntryCheck/CheckEntry";
        protected override string HostCore => "127.0.0.1";
        protected override string PeerCore => "ipv4:127.0.0.1:1";
        protected override DateTime DeadlineCore => DateTime.MaxValue;
        protected override Metadata RequestHeadersCore => [];
        protected override CancellationToken CancellationTokenCore => CancellationToken.None;
        protected override Metadata ResponseTrailersCore => [];
        protected override Status StatusCore { get; set; }
        protected override WriteOptions? WriteOptionsCore { get; set; }
        protected override AuthContext AuthContextCore => new(null, []);
        protected override ContextPropagationToken CreatePropagationTokenCore(ContextPropagationOptions? options) => throw new NotSupportedException();
        protected override Task WriteResponseHeadersAsyncCore(Metadata responseHeaders) => Task.CompletedTask;
    }
}
