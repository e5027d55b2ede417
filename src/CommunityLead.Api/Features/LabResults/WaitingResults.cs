using System.Globalization;
using System.Text.Json;
using CommunityLead.Api.Auth;
using CommunityLead.Api.Data;
using CommunityLead.Api.Data.Entities;
using CommunityLead.Api.Features.Kits;
using CommunityLead.Rules.Interpretation;
using CommunityLead.Rules.Kits;
using CommunityLead.Rules.LabResults;
using Microsoft.EntityFrameworkCore;

namespace CommunityLead.Api.Features.LabResults;

/// <summary>
/// Results for a kit whose collection form was never recorded (households often mail the form inside the kit, and
/// the lab may report before the coordinator types it in). They are stored without a collection time and wait,
/// with an attention item; when the form is recorded they are matched to its bottles, their holding times judged,
/// and the kit moves on and is interpreted as if the form had come first. Nothing the lab sent is lost.
/// </summary>
public static class WaitingResults
{
    /// <summary>Raises the kit's item once (BatchEffects, when a batch comes into effect); none while one is open.</summary>
    public static async Task RaiseAsync(CommunityLeadDb db, KitWrites writes, Kit kit, LabBatch batch, IReadOnlyList<LabResult> results, DateTime nowUtc,
        CancellationToken ct)
    {
        if (await db.Attention.AnyAsync(a => a.KitId == kit.Id && a.ResolvedAtUtc == null && a.Reason == AttentionFlag.AwaitingCollection, ct))
            return;
        var highest = results.Where(r => r.KitId == kit.Id && r.Analyte == Analyte.Lead).MaxBy(r => r.Value);
        var lead = highest is null ? "" : $" Highest lead: {highest.Value.ToString("0.###", CultureInfo.InvariantCulture)} {highest.Unit}.";
        writes.Attention.Add(AttentionItem.Raise(kit.Id, kit.Code, AttentionFlag.AwaitingCollection,
            $"Results for kit {kit.Code} came in (batch {batch.BatchId}), but its collection form was never recorded. " +
            $"Record the bottles and the results are interpreted at once.{lead}", nowUtc));
    }

    /// <summary>What recording the collection did to waiting results.</summary>
    /// <param name="Errors">Bottles dated after the lab analyzed or acidified them (nothing may be saved).</param>
    /// <param name="Completed">The kit moved to analyzed: interpret it in the same save.</param>
    public sealed record Match(Dictionary<string, string[]> Errors, bool Completed);

    /// <summary>Matches the kit's waiting results to the collection just recorded (tracked, not saved).</summary>
    public static async Task<Match> MatchAsync(CommunityLeadDb db, Kit kit, IReadOnlyList<Sample> samples, HoldingLimits holding,
        JsonSerializerOptions json, Actor actor, DateTime nowUtc, CancellationToken ct)
    {
        var errors = new Dictionary<string, string[]>();
        var current = await db.LabResults.Include(r => r.Batch).Where(r => r.KitId == kit.Id && r.SupersededAtUtc == null).ToListAsync(ct);
        var waiting = current.Where(r => r.CollectedAt is null).ToList();
        if (waiting.Count == 0) return new(errors, false);
        foreach (var result in waiting)
        {
            var index = samples.ToList().FindIndex(s => s.Bottle == result.Bottle && s.Position == result.Position
                                                        && (result.Location is null || s.Location == result.Location));
            if (index < 0) continue;
            var sample = samples[index];
            if (result.Batch!.AnalyzedAt < sample.CollectedAt || result.AcidifiedAt < sample.CollectedAt)
            {
                errors[$"samples[{index}].collectedAt"] = [$"The lab {(result.Batch.AnalyzedAt < sample.CollectedAt ? "analyzed" : "acidified")} this bottle " +
                    "before this time: it must have been collected earlier. Check the date and time on the form."];
                continue;
            }
            result.CollectedAt = sample.CollectedAt;
            var flags = HoldingTimes.Check(sample.CollectedAt, result.Batch.AnalyzedAt, result.AcidifiedAt, holding);
            result.HoldingFlags = flags.Count == 0 ? null : JsonSerializer.Serialize(flags, json);
        }
        if (errors.Count > 0) return new(errors, false);

        var lead = current.Where(r => r.Batch!.InEffect && r.Analyte == Analyte.Lead).Select(r => (r.Bottle, r.Position, r.Location)).ToHashSet();
        var complete = samples.All(s => lead.Contains((s.Bottle, s.Position, s.Location)) || lead.Contains((s.Bottle, s.Position, null)));
        if (!complete || KitTransitions.Apply(db, kit, KitAction.RecordResults, actor, nowUtc,
                detail: $"{waiting.Count} results that waited for the collection form") is not null)
            return new(errors, false);
        await db.Attention.Where(a => a.KitId == kit.Id && a.ResolvedAtUtc == null && a.Reason == AttentionFlag.AwaitingCollection)
            .ForEachAsync(a => (a.ResolvedAtUtc, a.ResolvedBy, a.ResolutionNote) = (nowUtc, actor.Label, "Collection recorded; the waiting results were interpreted."), ct);
        return new(errors, true);
    }
}
