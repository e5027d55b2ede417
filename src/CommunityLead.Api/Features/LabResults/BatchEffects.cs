using CommunityLead.Api.Auth;
using CommunityLead.Api.Data;
using CommunityLead.Api.Data.Entities;
using CommunityLead.Api.Features.Kits;
using CommunityLead.Api.Infrastructure;
using CommunityLead.Rules.Interpretation;
using CommunityLead.Rules.Kits;
using CommunityLead.Rules.LabResults;
using Microsoft.AspNetCore.Http.HttpResults;
using Microsoft.EntityFrameworkCore;

namespace CommunityLead.Api.Features.LabResults;

/// <summary>
/// What happens when a batch's results come into effect (accepted at intake, or released later): earlier
/// results for the same bottle and analyte are superseded, kits whose every bottle now has a lead result
/// move to analyzed, and a kit whose letter already went out goes on the attention list. Kits that can no
/// longer take results (cancelled, replaced, closed, lost) keep their state.
/// Reads without tracking and writes nothing: what is to be written comes back in the outcome (<see cref="Outcome.Writes"/>,
/// <see cref="Outcome.Superseded"/>), written in bulk by <see cref="WriteAsync"/> inside the caller's transaction.
/// </summary>
public static class BatchEffects
{
    /// <summary>The kits that reached analyzed, ready to be interpreted once saved; or a conflict.</summary>
    /// <param name="Superseded">Stored results (earlier ones, or a released batch's own) that this batch's results replace.</param>
    public sealed record Outcome(ProblemHttpResult? Conflict, IReadOnlyList<int> Analyzed, KitWrites Writes, IReadOnlyList<long> Superseded)
    {
        /// <summary>Marks the superseded results, then the kits' moves with their audit entries and attention items.</summary>
        public async Task WriteAsync(CommunityLeadDb db, DateTime nowUtc)
        {
            var superseded = Superseded.ToList();
            if (superseded.Count > 0)
                await db.LabResults.Where(r => superseded.Contains(r.Id))
                    .ExecuteUpdateAsync(set => set.SetProperty(r => r.SupersededAtUtc, nowUtc), CancellationToken.None);
            await Writes.FlushAsync(db);
        }
    }

    /// <summary>
    /// A batch's effects once its results are stored (at intake, or a held batch released), inside the caller's
    /// transaction: its kits a chunk at a time, each chunk's moves written and the kits it completed handed to
    /// <paramref name="interpret"/> before the next chunk is read, so memory stays bounded however large the batch.
    /// A kit's effects depend only on that kit's rows, so chunking by kit decides exactly what the whole batch at once would.
    /// </summary>
    /// <exception cref="ConflictException">A kit cannot move (nothing of the transaction may be kept).</exception>
    public static async Task ApplyStoredAsync(CommunityLeadDb db, LabBatch batch, Actor actor, DateTime nowUtc,
        Func<IReadOnlyList<int>, Task> interpret)
    {
        var none = CancellationToken.None;
        var kitIds = await db.LabResults.Where(r => r.LabBatchId == batch.Id).Select(r => r.KitId).Distinct().OrderBy(id => id).ToListAsync(none);
        foreach (var chunk in kitIds.Chunk(BatchChecker.ChunkSize))
        {
            var results = await db.LabResults.AsNoTracking().Where(r => r.LabBatchId == batch.Id && chunk.Contains(r.KitId)).ToListAsync(none);
            var outcome = await ApplyAsync(db, batch, results, actor, nowUtc, none);
            if (outcome.Conflict is { } conflict) throw new ConflictException(conflict);
            await outcome.WriteAsync(db, nowUtc);
            await interpret(outcome.Analyzed);
        }
    }

    /// <summary>A kit the batch cannot move: the answer to give once the transaction is rolled back.</summary>
    public sealed class ConflictException(ProblemHttpResult problem) : Exception(problem.ProblemDetails.Title)
    {
        public ProblemHttpResult Problem { get; } = problem;
    }

    public static async Task<Outcome> ApplyAsync(CommunityLeadDb db, LabBatch batch, IReadOnlyList<LabResult> results,
        Actor actor, DateTime nowUtc, CancellationToken ct)
    {
        var kitIds = results.Select(r => r.KitId).Distinct().ToList();
        // The kits are read before their results and each whose figures change gets a new version below, so two batches posted at
        // once for different bottles of one kit cannot both miss each other's rows and leave the kit waiting:
        // the second to save fails on the version (409, post again) and then sees the first one's rows.
        var kits = await db.Kits.AsNoTracking().Where(k => kitIds.Contains(k.Id)).ToListAsync(ct);
        var earlier = await db.LabResults.AsNoTracking().Include(r => r.Batch)
            .Where(r => kitIds.Contains(r.KitId) && r.SupersededAtUtc == null && r.LabBatchId != batch.Id
                        && (r.Batch!.Status == BatchStatus.Accepted || r.Batch.Status == BatchStatus.Released))
            .ToListAsync(ct);
        // A held batch released late must not override what the lab posted after it: for those bottles its own
        // results yield (kept, superseded) and the newer ones stay current.
        var newer = earlier.Where(r => r.Batch!.PostedAtUtc > batch.PostedAtUtc).Select(Key).ToHashSet();
        var superseded = new List<long>();
        foreach (var late in results.Where(r => newer.Contains(Key(r))))
        {
            late.SupersededAtUtc = nowUtc;
            // A released batch's rows are stored already; a new batch's are inserted as they are now.
            if (late.Id != 0) superseded.Add(late.Id);
        }
        results = [.. results.Where(r => r.SupersededAtUtc is null)];
        var incoming = results.Select(Key).ToHashSet();
        var replaced = earlier.Where(r => incoming.Contains(Key(r))).ToLookup(Key);
        foreach (var old in replaced.SelectMany(g => g))
        {
            old.SupersededAtUtc = nowUtc;
            superseded.Add(old.Id);
        }
        // A correction repeats the rows it did not change; kits whose figures all came back the same keep their
        // state, so their households are not sent the same letter again.
        var changedKits = results.Where(r => !replaced[Key(r)].Any(old => SameFigures(old, r))).Select(r => r.KitId).ToHashSet();

        var covered = earlier.Where(r => r.SupersededAtUtc is null).Concat(results)
            .Where(r => r.Analyte == Analyte.Lead)
            .ToLookup(r => r.KitId, r => (r.Bottle, r.Position, r.Location));
        var bottles = (await db.CurrentSamples(kitIds)
                .Select(x => new { x.KitId, x.Sample.Bottle, x.Sample.Position, x.Sample.Location })
                .ToListAsync(ct))
            .ToLookup(s => s.KitId, s => (s.Bottle, s.Position, s.Location));
        var resultsPerKit = results.CountBy(r => r.KitId).ToDictionary();
        kits = [.. kits.Where(k => resultsPerKit.ContainsKey(k.Id))];
        var analyzed = new List<int>();
        var writes = new KitWrites();
        foreach (var kit in kits.Select(writes.Track))
        {
            if (changedKits.Contains(kit.Id)) kit.Version++;
            // A held batch released days later may find a kit replaced, cancelled or closed meanwhile. Its
            // results are kept on record (the batch view flags them) but move nothing, and the rest of the
            // batch still comes into effect; at intake the checker refuses such kits outright.
            if (!KitLifecycle.TryMove(kit.State, KitAction.RecordResults, out _))
            {
                // A closed kit's household already has its letter: new figures for it need a person to look.
                if (kit.State == KitState.Closed && changedKits.Contains(kit.Id))
                    writes.Attention.Add(AttentionItem.Raise(kit.Id, kit.Code, AttentionFlag.CorrectedAfterLetter,
                        $"Results released for closed kit {kit.Code} differ from its letter (batch {batch.BatchId} version {batch.Version}); " +
                        "the kit stays closed: call the household, and issue a replacement kit if a new test is needed.", nowUtc));
                continue;
            }
            if (!bottles[kit.Id].Any())
            {
                // No collection form yet: the results wait for it (WaitingResults), and a person is told.
                await WaitingResults.RaiseAsync(db, writes, kit, batch, results, nowUtc, ct);
                continue;
            }
            var lead = covered[kit.Id].ToHashSet();
            if (!changedKits.Contains(kit.Id) || !bottles[kit.Id].All(lead.Contains)) continue;
            var letterWentOut = kit.State == KitState.LetterSent;
            var detail = $"batch {batch.BatchId} v{batch.Version}: {resultsPerKit[kit.Id]} results";
            if (KitTransitions.Apply(kit, KitAction.RecordResults, actor, nowUtc, writes.Record, detail: detail) is { } illegal)
                return new Outcome(illegal, [], new KitWrites(), []);
            analyzed.Add(kit.Id);
            if (letterWentOut)
                writes.Attention.Add(AttentionItem.Raise(kit.Id, kit.Code, AttentionFlag.CorrectedAfterLetter,
                    $"Corrected result — new letter needed (batch {batch.BatchId} version {batch.Version}).", nowUtc));
        }
        return new Outcome(null, analyzed, writes, superseded);
    }

    private static bool SameFigures(LabResult a, LabResult b) =>
        a.Value == b.Value && a.Unit == b.Unit && a.Qualifier == b.Qualifier && a.Mdl == b.Mdl
        && a.ReportingLimit == b.ReportingLimit && a.Uncertainty == b.Uncertainty;

    private static (int, Rules.Sampling.BottleType, int?, Rules.Sampling.SoilLocation?, Analyte) Key(LabResult r) =>
        (r.KitId, r.Bottle, r.Position, r.Location, r.Analyte);
}
