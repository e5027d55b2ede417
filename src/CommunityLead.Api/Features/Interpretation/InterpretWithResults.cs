using CommunityLead.Api.Auth;
using CommunityLead.Api.Data;
using CommunityLead.Api.Features.Operations;
using Microsoft.AspNetCore.Http.Json;
using Microsoft.EntityFrameworkCore;
using Microsoft.Extensions.Options;
using KitOutcome = CommunityLead.Rules.Interpretation.Interpretation;

namespace CommunityLead.Api.Features.Interpretation;

/// <summary>
/// Saves a batch's results (and what they did to kits) and interprets the kits they completed, in one database
/// transaction: results are never on record without the interpretation, and so the attention items, they call
/// for. Once writing begins the caller's token is no longer used: a lab whose request times out on a large batch,
/// or disconnects, must not leave urgent kits analyzed with no one told. A process killed midway leaves nothing
/// (the database rolls the transaction back), so the lab's next post is a first post, not a repeat.
/// Why one transaction rather than a queue worked in the background: DEVELOPERS.md, "Results and interpretation".
/// </summary>
public sealed class InterpretWithResults(CommunityLeadDb db, ProfileCatalog catalog, IOptions<JsonOptions> json)
{
    /// <summary>
    /// Saves everything the context tracks, then what <paramref name="bulk"/> writes without the change tracker (a
    /// batch's rows: <see cref="BulkInsert"/>, <see cref="KitWrites"/>), then interprets <paramref name="completedKits"/>.
    /// A lost race throws the <see cref="DbUpdateException"/> of the failed write, with nothing written.
    /// </summary>
    public Task SaveAsync(IReadOnlyList<int> completedKits, Actor actor, DateTime nowUtc, Func<CommunityLeadDb, Task>? bulk = null) =>
        SaveAsync(actor, nowUtc, async (store, interpret) =>
        {
            if (bulk is not null) await bulk(store);
            await interpret(completedKits);
        });

    /// <summary>
    /// Saves everything the context tracks, then runs <paramref name="work"/>, which writes without the change tracker
    /// and hands each set of kits it completed to the function it is given, to be interpreted there and then (a large
    /// batch a chunk of kits at a time); all in the one transaction. Whatever <paramref name="work"/> throws leaves nothing written.
    /// </summary>
    public async Task SaveAsync(Actor actor, DateTime nowUtc, Func<CommunityLeadDb, Func<IReadOnlyList<int>, Task>, Task> work)
    {
        var uncancellable = CancellationToken.None;
        await using var transaction = await db.Database.BeginTransactionAsync(uncancellable);
        await db.SaveChangesAsync(uncancellable);
        var bands = new List<Rules.Interpretation.Band>();
        await work(db, async completedKits =>
        {
            if (completedKits.Count == 0) return;
            // What the context tracked is saved; the interpretation reads what it needs afresh, inside this transaction.
            db.ChangeTracker.Clear();
            var outcomes = await KitInterpreting.InterpretAsync(db, catalog, completedKits, actor, nowUtc, json.Value.SerializerOptions, uncancellable);
            bands.AddRange(outcomes.Values.Select(o => o.Band));
        });
        await transaction.CommitAsync(uncancellable);
        ServiceMetrics.Interpreted(bands);
    }
}
