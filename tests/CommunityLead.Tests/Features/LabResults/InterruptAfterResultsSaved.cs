using System.Runtime.CompilerServices;
using CommunityLead.Api.Data;
using CommunityLead.Api.Data.Entities;
using CommunityLead.Tests.Infrastructure;
using Microsoft.AspNetCore.Http;
using Microsoft.EntityFrameworkCore;
using Microsoft.EntityFrameworkCore.Diagnostics;
using Microsoft.Extensions.DependencyInjection;

namespace CommunityLead.Tests.Features.LabResults;

/// <summary>
/// Interrupts a lab post or a release at the moment its results have been written: the client goes away (the
/// request is aborted, so its token is cancelled, as when a lab's client times out), or the process dies (the next
/// save throws, as a killed process never reaches what comes after). It acts inside the save itself, not on a
/// timer, so the interruption always lands at the same point.
/// </summary>
internal sealed class InterruptAfterResultsSaved : SaveChangesInterceptor
{
    public enum Mode { ClientDisconnects, ProcessDies }

    private readonly Mode mode;
    private readonly ConditionalWeakTable<DbContext, object> writingResults = new();
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

    public override ValueTask<InterceptionResult<int>> SavingChangesAsync(DbContextEventData eventData, InterceptionResult<int> result,
        CancellationToken cancellationToken = default)
    {
        var db = eventData.Context!;
        if (Armed && mode == Mode.ProcessDies && resultsWritten.TryGetValue(db, out _))
        {
            Interlocked.Increment(ref interruptions);
            throw new InvalidOperationException("Simulated end of the process: nothing after the results' save runs.");
        }
        if (Armed && WritesResults(db)) writingResults.AddOrUpdate(db, this);
        return base.SavingChangesAsync(eventData, result, cancellationToken);
    }

    public override ValueTask<int> SavedChangesAsync(SaveChangesCompletedEventData eventData, int result, CancellationToken cancellationToken = default)
    {
        var db = eventData.Context!;
        if (writingResults.Remove(db))
        {
            if (mode == Mode.ProcessDies) resultsWritten.AddOrUpdate(db, this);
            else if (requests?.HttpContext is { } request)
            {
                Interlocked.Increment(ref interruptions);
                request.Abort();
                TokenCancelled = request.RequestAborted.IsCancellationRequested;
            }
        }
        return base.SavedChangesAsync(eventData, result, cancellationToken);
    }

    /// <summary>A lab post (new results) or a release (a held batch put into effect).</summary>
    private static bool WritesResults(DbContext db) =>
        db.ChangeTracker.Entries<LabResult>().Any(e => e.State == EntityState.Added)
        || db.ChangeTracker.Entries<LabBatch>().Any(e => e.State == EntityState.Modified && e.Entity.Status == BatchStatus.Released);
}
