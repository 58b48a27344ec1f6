using System.Collections.Concurrent;
using Microsoft.Extensions.Logging;

namespace BenchRunner.Daemon.Tests.Support;

/// <summary>A logger provider that keeps every message it receives, with its event id and named values.</summary>
internal sealed class CollectingLoggerProvider : ILoggerProvider
{
    public ConcurrentQueue<LoggedEvent> Events { get; } = new();

    public ILogger CreateLogger(string categoryName) => new Collector(this);

    public void Dispose()
    {
    }

    public IReadOnlyList<LoggedEvent> Named(string eventName) => [.. Events.Where(e => e.Id.Name == eventName)];

    private sealed class Collector(CollectingLoggerProvider owner) : ILogger
    {
        public IDisposable? BeginScope<TState>(TState state) where TState : notnull => null;

        public bool IsEnabled(LogLevel logLevel) => true;

        public void Log<TState>(LogLevel logLevel, EventId eventId, TState state, Exception? exception, Func<TState, Exception?, string> formatter)
        {
            var values = state is IEnumerable<KeyValuePair<string, object?>> pairs
                ? pairs.ToDictionary(p => p.Key, p => p.Value)
                : [];
            owner.Events.Enqueue(new LoggedEvent(logLevel, eventId, formatter(state, exception), values));
        }
    }
}

internal sealed record LoggedEvent(LogLevel Level, EventId Id, string Message, Dictionary<string, object?> Values);
