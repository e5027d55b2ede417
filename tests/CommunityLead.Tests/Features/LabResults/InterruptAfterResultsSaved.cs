using System.Data.Common;
using System.Runtime.CompilerServices;
using CommunityLead.Api.Data;
using CommunityLead.Tests.Infrastructure;
using Microsoft.AspNetCore.Http;
using Microsoft.EntityFrameworkCore;
using Microsoft.EntityFrameworkCore.Diagnostics;
using Microsoft.Extensions.DependencyInjection;

namespace CommunityLead.Tests.Features.LabResults;

/// <summary>
/// Interrupts a lab post or a release at the moment its results have been written: the client goes away (the
/// request is aborted, so its token is cancelled, as when a lab's client times out), or the process dies (the next
/// command throws, as a killed process never reaches what comes after). It acts on the database commands EF Core runs,
/// not on a timer, so the interruption always lands at the same point: right after the statement that inserts the
/// batch's row (its results follow it in bulk, BulkInsert, on the same transaction), or that marks a held batch released.
/// </summary>
internal sealed class InterruptAfterResultsSaved : DbCommandInterceptor
{
    public enum Mode { ClientDisconnects, ProcessDies }

    private readonly Mode mode;
    private readonly ConditionalWeakTable<DbContext, object> resultsWritten = new();
    private IHttpContextAccessor? requests;
    private int interruptions;

    private InterruptAfterResultsSaved(Mode mode) => this.mode = mode;

    /// <summary>How often it interrupted; a test asserts it did, so it can never pass without being tried.</summary>
    public int Interruptions => Volatile.Read(ref interruptions);

    /// <summary>Whether the aborted request's token was seen cancelled right after the abort.</summary>
    public bool TokenCancelled { get; private set; }

    public bool Armed { get; set; } = true;

    public static InterruptAfterResultsSaved Install(IServiceCollection services, Mode mode)
    {
        var hook = new InterruptAfterResultsSaved(mode);
        services.AddHttpContextAccessor();
        void Configure(IServiceProvider provider, DbContextOptionsBuilder options)
        {
            hook.requests = provider.GetRequiredService<IHttpContextAccessor>();
            options.AddInterceptors(hook);
        }
        // The context type whose options the service registered (StorageSetup): the PostgreSQL one on that run.
        if (TestStore.IsPostgres) services.ConfigureDbContext<PostgresCommunityLeadDb>(Configure);
        else services.ConfigureDbContext<CommunityLeadDb>(Configure);
        return hook;
    }

    public override ValueTask<InterceptionResult<DbDataReader>> ReaderExecutingAsync(DbCommand command, CommandEventData eventData,
        InterceptionResult<DbDataReader> result, CancellationToken cancellationToken = default)
    {
        DieIfWritten(eventData.Context);
        return base.ReaderExecutingAsync(command, eventData, result, cancellationToken);
    }

    public override ValueTask<InterceptionResult<int>> NonQueryExecutingAsync(DbCommand command, CommandEventData eventData,
        InterceptionResult<int> result, CancellationToken cancellationToken = default)
    {
        DieIfWritten(eventData.Context);
        return base.NonQueryExecutingAsync(command, eventData, result, cancellationToken);
    }

    public override ValueTask<DbDataReader> ReaderExecutedAsync(DbCommand command, CommandExecutedEventData eventData, DbDataReader result,
        CancellationToken cancellationToken = default)
    {
        AfterCommand(command, eventData.Context);
        return base.ReaderExecutedAsync(command, eventData, result, cancellationToken);
    }

    public override ValueTask<int> NonQueryExecutedAsync(DbCommand command, CommandExecutedEventData eventData, int result,
        CancellationToken cancellationToken = default)
    {
        AfterCommand(command, eventData.Context);
        return base.NonQueryExecutedAsync(command, eventData, result, cancellationToken);
    }

    private void DieIfWritten(DbContext? db)
    {
        if (!Armed || mode != Mode.ProcessDies || db is null || !resultsWritten.TryGetValue(db, out _)) return;
        Interlocked.Increment(ref interruptions);
        throw new InvalidOperationException("Simulated end of the process: nothing after the results' save runs.");
    }

    private void AfterCommand(DbCommand command, DbContext? db)
    {
        if (!Armed || db is null || !WritesResults(command) || resultsWritten.TryGetValue(db, out _)) return;
        resultsWritten.AddOrUpdate(db, this);
        if (mode == Mode.ClientDisconnects && requests?.HttpContext is { } request)
        {
            Interlocked.Increment(ref interruptions);
            request.Abort();
            TokenCancelled = request.RequestAborted.IsCancellationRequested;
        }
    }

    /// <summary>A lab post (new results) or a release (a held batch put into effect).</summary>
    private static bool WritesResults(DbCommand command) =>
        command.CommandText.Contains("INSERT INTO \"LabBatches\"", StringComparison.Ordinal)
        || (command.CommandText.Contains("UPDATE \"LabBatches\"", StringComparison.Ordinal)
            && command.CommandText.Contains("\"ReleasedAtUtc\"", StringComparison.Ordinal));
}
