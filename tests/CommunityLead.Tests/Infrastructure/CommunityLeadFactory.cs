using System.Net.Http.Headers;
using CommunityLead.Api.Auth;
using Microsoft.AspNetCore.Hosting;
using Microsoft.AspNetCore.Mvc.Testing;
using Microsoft.Data.Sqlite;
using Microsoft.EntityFrameworkCore;
using Microsoft.Extensions.DependencyInjection;
using Microsoft.Extensions.DependencyInjection.Extensions;
using Microsoft.Extensions.Hosting;
using Microsoft.Extensions.Logging;

namespace CommunityLead.Tests.Infrastructure;

/// <summary>
/// The real app on a real database of its own: one factory per test, never a shared database. A SQLite
/// file by default; a PostgreSQL database when the run is pointed at a server (<see cref="TestStore"/>).
/// <see cref="CreateClient(string)"/> signs in as a role with a freshly made key.
/// </summary>
public sealed class CommunityLeadFactory : WebApplicationFactory<Program>
{
    private readonly string folder = Path.Combine(Path.GetTempPath(), "cl-tests", Guid.NewGuid().ToString("N"));

    private readonly bool ownsDatabase;
    private readonly Action<IServiceCollection>? extraServices;

    /// <param name="now">The test clock's start.</param>
    /// <param name="sharedConnectionString">Another instance's database (a second service instance on the same
    /// store); this factory then leaves it in place when disposed.</param>
    /// <param name="services">Test-only services added after the service's own (a log capture, a save interceptor).</param>
    public CommunityLeadFactory(DateTimeOffset? now = null, string? sharedConnectionString = null, Action<IServiceCollection>? services = null)
    {
        extraServices = services;
        Clock = new TestClock(now ?? new DateTimeOffset(2026, 4, 10, 12, 0, 0, TimeSpan.Zero));
        ownsDatabase = sharedConnectionString is null;
        ConnectionString = sharedConnectionString
            ?? (TestStore.IsPostgres ? TestStore.CreatePostgresDatabase() : $"Data Source={DatabaseFile}");
    }

    public TestClock Clock { get; }

    /// <summary>Every error the service logged, for tests that assert a start or a request was clean.</summary>
    public ErrorLog Errors { get; } = new();

    /// <summary>Every warning and error, for tests of what the service logs.</summary>
    public ErrorLog Warnings { get; } = new(LogLevel.Warning);

    /// <summary>
    /// Settings of this test's service, applied over appsettings.json; a test sets its own before first use
    /// (<c>new CommunityLeadFactory { Settings = { ["RateLimits:LabBatchesPerKey"] = "2" } }</c>). The rate limits
    /// are raised by default: a test makes many requests with one key from one address, faster than any client.
    /// </summary>
    public Dictionary<string, string?> Settings { get; } = new()
    {
        ["RateLimits:FailedSignInsPerAddress"] = "100000",
        ["RateLimits:FailedSignInsPerKeyId"] = "100000",
        ["RateLimits:LabBatchesPerKey"] = "100000",
        ["RateLimits:LetterBatchesPerKey"] = "100000",
        // Off unless a test asks for it: a look in the background must not race a test's own requests or its end.
        ["Reports:DecideInBackgroundEvery"] = "00:00:00",
    };
    public string DatabaseFile => Path.Combine(folder, "test.db");
    public string ConnectionString { get; }

    protected override void ConfigureWebHost(IWebHostBuilder builder)
    {
        Directory.CreateDirectory(folder);
        builder.UseEnvironment("Testing");
        builder.UseSetting("ConnectionStrings:CommunityLead", ConnectionString);
        builder.UseSetting("Database:Provider", TestStore.IsPostgres ? "Postgres" : "Sqlite");
        foreach (var (name, value) in Settings) builder.UseSetting(name, value);
        builder.ConfigureLogging(logging =>
        {
            logging.AddProvider(Errors);
            logging.AddProvider(Warnings);
        });
        builder.ConfigureServices(services =>
        {
            services.RemoveAll<TimeProvider>();
            services.AddSingleton<TimeProvider>(Clock);
            extraServices?.Invoke(services);
        });
    }

    /// <summary>
    /// Areas on the program's list before the test runs (households must name an active one): those the fixtures'
    /// households use. A test of the list itself sets its own (none: <c>Areas = []</c>).
    /// </summary>
    public string[] Areas { get; init; } = ["riverside", "north", "harbour"];

    protected override IHost CreateHost(IHostBuilder builder)
    {
        var host = base.CreateHost(builder);
        // The service has migrated its database by now (Program.cs does so before it serves), unless a test of an
        // unreachable or unmigrated store said not to.
        if (!host.Services.GetRequiredService<Microsoft.Extensions.Options.IOptions<CommunityLead.Api.Infrastructure.DatabaseOptions>>().Value.MigrateOnStartup)
            return host;
        using var scope = host.Services.CreateScope();
        var db = scope.ServiceProvider.GetRequiredService<CommunityLead.Api.Data.CommunityLeadDb>();
        // ON CONFLICT DO NOTHING (both stores): two instances started together on one database (TwoInstancesTests)
        // may list the same areas at once, and a lost insert race must not be logged as the service's error.
        foreach (var code in Areas)
            db.Database.ExecuteSqlInterpolated(
                $"INSERT INTO \"Areas\" (\"Code\", \"Active\", \"Name\") VALUES ({code}, TRUE, {code}) ON CONFLICT DO NOTHING");
        return host;
    }

    public HttpClient CreateClient(string role)
    {
        var client = CreateClient();
        client.DefaultRequestHeaders.Authorization = new AuthenticationHeaderValue("Bearer", CreateKey(role));
        return client;
    }

    public string CreateKey(string role, string? label = null)
    {
        using var scope = Services.CreateScope();
        var keys = scope.ServiceProvider.GetRequiredService<ApiKeyService>();
        return keys.CreateAsync(role, label ?? $"{role}-{Guid.NewGuid():N}").GetAwaiter().GetResult().Key;
    }

    public T WithDb<T>(Func<CommunityLead.Api.Data.CommunityLeadDb, T> read)
    {
        using var scope = Services.CreateScope();
        return read(scope.ServiceProvider.GetRequiredService<CommunityLead.Api.Data.CommunityLeadDb>());
    }

    protected override void Dispose(bool disposing)
    {
        base.Dispose(disposing);
        if (TestStore.IsPostgres)
        {
            if (ownsDatabase) TestStore.DropPostgresDatabase(ConnectionString);
            return;
        }
        SqliteConnection.ClearAllPools();
        try { Directory.Delete(folder, recursive: true); } catch (IOException) { }
    }
}

/// <summary>A clock the test sets, so "now" and "in the future" don't depend on when the suite runs.</summary>
public sealed class TestClock(DateTimeOffset now) : TimeProvider
{
    public DateTimeOffset Now { get; set; } = now;

    /// <summary>
    /// Follows the real clock instead of <see cref="Now"/>: for a browser, which stamps times from the computer's
    /// clock (a receipt "now"), so "in the future" means the same to the page and to the service however long a run takes.
    /// </summary>
    public bool Running { get; set; }

    public override DateTimeOffset GetUtcNow() => Running ? DateTimeOffset.UtcNow : Now.ToUniversalTime();
}

/// <summary>Keeps the messages of log entries at Error (or the level given) or above.</summary>
public sealed class ErrorLog(LogLevel minimum = LogLevel.Error) : ILoggerProvider
{
    private readonly System.Collections.Concurrent.ConcurrentQueue<string> entries = new();

    public IReadOnlyList<string> Entries => [.. entries];

    public ILogger CreateLogger(string categoryName) => new Logger(categoryName, entries, minimum);

    public void Dispose() { }

    private sealed class Logger(string category, System.Collections.Concurrent.ConcurrentQueue<string> entries, LogLevel minimum) : ILogger
    {
        public IDisposable? BeginScope<TState>(TState state) where TState : notnull => null;
        public bool IsEnabled(LogLevel logLevel) => logLevel >= minimum;
        public void Log<TState>(LogLevel logLevel, EventId eventId, TState state, Exception? exception, Func<TState, Exception?, string> formatter)
        {
            if (IsEnabled(logLevel)) entries.Enqueue($"{category}: {formatter(state, exception)}");
        }
    }
}
