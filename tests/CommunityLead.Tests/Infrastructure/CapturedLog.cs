using System.Collections.Concurrent;
using Microsoft.Extensions.Logging;

namespace CommunityLead.Tests.Infrastructure;

/// <summary>Keeps every log entry at Information or above, for tests that check what the service wrote down.</summary>
public sealed class CapturedLog : ILoggerProvider
{
    private readonly ConcurrentQueue<(string Category, LogLevel Level, string Message)> entries = new();

    public IReadOnlyList<(string Category, LogLevel Level, string Message)> Entries => [.. entries];

    public ILogger CreateLogger(string categoryName) => new Logger(categoryName, entries);

    public void Dispose() { }

    private sealed class Logger(string category, ConcurrentQueue<(string, LogLevel, string)> entries) : ILogger
    {
        public IDisposable? BeginScope<TState>(TState state) where TState : notnull => null;
        public bool IsEnabled(LogLevel logLevel) => logLevel >= LogLevel.Information;
        public void Log<TState>(LogLevel logLevel, EventId eventId, TState state, Exception? exception, Func<TState, Exception?, string> formatter)
        {
            if (IsEnabled(logLevel)) entries.Enqueue((category, logLevel, formatter(state, exception)));
        }
    }
}
