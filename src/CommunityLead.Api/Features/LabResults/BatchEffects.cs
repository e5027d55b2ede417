using CommunityLead.Api.Auth;
using CommunityLead.Api.Data;
using CommunityLead.Api.Data.Entities;
using CommunityLead.Api.Features.Kits;
using CommunityLead.Api.Infrastructure;
using CommunityLead.Rules.Kits;
using CommunityLead.Rules.LabResults;
using Microsoft.AspNetCore.Http.HttpResults;
using Microsoft.EntityFrameworkCore;

namespace CommunityLead.Api.Features.LabResults;

/// <summary>
/// What happens when a batch's results come into effect (accepted at intake, or released later): earlier
/// results for the same bottle and analyte are superseded, kits whose every bottle now has a lead result
/// move to analyzed, and a kit whose letter already went out goes on the attention list.
/// Runs inside the caller's unit of work; nothing is saved here.
/// </summary>
public static class BatchEffects
{
    public static async Task<ProblemHttpResult?> ApplyAsync(CommunityLeadDb db, LabBatch batch, IReadOnlyList<LabResult> results,
        Actor actor, DateTime nowUtc, CancellationToken ct)
    {
        var kitIds = results.Select(r => r.KitId).Distinct().ToList();
        var earlier = await db.LabResults
            .Where(r => kitIds.Contains(r.KitId) && r.SupersededAtUtc == null && r.LabBatchId != batch.Id
                        && (r.Batch!.Status == BatchStatus.Accepted || r.Batch.Status == BatchStatus.Released))
            .ToListAsync(ct);
        var incoming = results.Select(Key).ToHashSet();
        foreach (var old in earlier.Where(r => incoming.Contains(Key(r))))
            old.SupersededAtUtc = nowUtc;

        var covered = earlier.Where(r => r.SupersededAtUtc is null).Concat(results)
            .Where(r => r.Analyte == Analyte.Lead)
            .ToLookup(r => r.KitId, r => (r.Bottle, r.Position, r.Location));
        var bottles = (await db.Samples.AsNoTracking()
                .Join(db.Collections.Where(c => kitIds.Contains(c.KitId) && c.SupersededAtUtc == null),
                    s => s.CollectionId, c => c.Id, (s, c) => new { c.KitId, s.Bottle, s.Position, s.Location })
                .ToListAsync(ct))
            .ToLookup(s => s.KitId, s => (s.Bottle, s.Position, s.Location));
        var kits = await db.Kits.Where(k => kitIds.Contains(k.Id)).ToListAsync(ct);
        var resultsPerKit = results.CountBy(r => r.KitId).ToDictionary();
        foreach (var kit in kits)
        {
            var lead = covered[kit.Id].ToHashSet();
            if (!bottles[kit.Id].All(lead.Contains)) continue;
            var letterWentOut = kit.State == KitState.LetterSent;
            var detail = $"batch {batch.BatchId} v{batch.Version}: {resultsPerKit[kit.Id]} results";
            if (KitTransitions.Apply(db, kit, KitAction.RecordResults, actor, nowUtc, detail: detail) is { } illegal)
                return illegal;
            if (letterWentOut)
                db.Attention.Add(new AttentionItem
                {
                    KitId = kit.Id, KitCode = kit.Code, Reason = AttentionReason.CorrectedAfterLetter, RaisedAtUtc = nowUtc,
                    Detail = $"Corrected result — new letter needed (batch {batch.BatchId} version {batch.Version}).",
                });
        }
        return null;
    }

    private static (int, Rules.Sampling.BottleType, int?, Rules.Sampling.SoilLocation?, Analyte) Key(LabResult r) =>
        (r.KitId, r.Bottle, r.Position, r.Location, r.Analyte);
}
