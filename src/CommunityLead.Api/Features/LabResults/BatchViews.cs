using System.Text.Json;
using CommunityLead.Api.Data;
using CommunityLead.Api.Data.Entities;
using CommunityLead.Api.Infrastructure;
using CommunityLead.Rules.Kits;
using CommunityLead.Rules.LabResults;
using Microsoft.EntityFrameworkCore;

namespace CommunityLead.Api.Features.LabResults;

/// <summary>Reads stored batches back as the lab and the coordinator see them.</summary>
public static class BatchViews
{
    /// <param name="forCoordinator">Whether the release reason is shown: the coordinator's own words, which may
    /// mention a household, so the lab sees only that and when the batch was released.</param>
    public static async Task<BatchOutcome> OutcomeAsync(CommunityLeadDb db, LabBatch batch, JsonSerializerOptions json, bool forCoordinator,
        CancellationToken ct)
    {
        var flagged = await db.LabResults.AsNoTracking()
            .Where(r => r.LabBatchId == batch.Id && r.HoldingFlags != null)
            .Select(r => new { r.KitCode, r.Bottle, r.Position, r.Location, r.Analyte, r.HoldingFlags })
            .ToListAsync(ct);
        var flags = flagged.SelectMany(r => Holding(r.HoldingFlags, json).Select(f => new ResultFlag(
            r.KitCode, r.Bottle, r.Position, r.Location, r.Analyte, KebabEnum.Name(f.Code), f.Message))).ToList();
        // Results for a kit that never took any and never will (a held batch released after the kit was
        // replaced, say). Closed kits are not flagged (their earlier results did count), nor lost ones (a lost
        // kit can still turn up and be received).
        var stopped = (await db.LabResults.AsNoTracking().Where(r => r.LabBatchId == batch.Id)
                .Join(db.Kits, r => r.KitId, k => k.Id, (r, k) => new { r.KitCode, r.Bottle, r.Position, r.Location, r.Analyte, k.State })
                .ToListAsync(ct))
            .Where(r => r.State is KitState.Cancelled or KitState.Rejected);
        flags.AddRange(stopped.Select(r => new ResultFlag(r.KitCode, r.Bottle, r.Position, r.Location, r.Analyte, "kit-not-open",
            $"Kit {r.KitCode} is {KebabEnum.Name(r.State)}: this result is kept on record but changes nothing for the kit.")));
        return new BatchOutcome(batch.BatchId, batch.Version, batch.Status, batch.Method, batch.AnalyzedAt, batch.ResultCount,
            JsonSerializer.Deserialize<QcVerdict>(batch.QcJson, json)!, flags, batch.CorrectionReason, batch.PostedAtUtc,
            batch.PostedBy, batch.ReleasedAtUtc is { } at ? new BatchRelease(at, batch.ReleasedBy!, forCoordinator ? batch.ReleaseReason : null) : null);
    }

    public static IReadOnlyList<HoldingFlag> Holding(string? stored, JsonSerializerOptions json) =>
        stored is null ? [] : JsonSerializer.Deserialize<List<HoldingFlag>>(stored, json)!;
}
