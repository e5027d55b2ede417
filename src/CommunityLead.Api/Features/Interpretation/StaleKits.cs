using System.Text.Json;
using CommunityLead.Api.Data;
using CommunityLead.Api.Data.Entities;
using CommunityLead.Rules.Interpretation;
using CommunityLead.Rules.Kits;
using Microsoft.EntityFrameworkCore;
using KitOutcome = CommunityLead.Rules.Interpretation.Interpretation;

namespace CommunityLead.Api.Features.Interpretation;

/// <summary>Which kits a repair looks at: the whole store, what came into effect lately, or one batch's kits.</summary>
/// <param name="BatchKey">The stored batch version (<see cref="LabBatch.Id"/>) a lab posted again.</param>
/// <param name="EffectiveSinceUtc">Newer results are looked for only in batches in effect from then on.</param>
public sealed record RepairScope(int? BatchKey = null, DateTime? EffectiveSinceUtc = null)
{
    public static readonly RepairScope WholeStore = new();
}

/// <summary>A kit found due, with the version it had then: it is repaired only if nothing changed it since.</summary>
public sealed record DueKit(int Id, string Code, int Version);

/// <summary>
/// Kits whose results in effect call for an interpretation they do not have: kits left analyzed (every bottle has
/// its lead result, nothing interpreted them), and interpreted kits whose results changed after the
/// interpretation was made. Both queries read indexes both stores have; neither reads a household.
/// </summary>
public static class StaleKits
{
    /// <summary>Analyzed kits after <paramref name="afterId"/>, in id order, at most <paramref name="take"/>.</summary>
    public static Task<List<DueKit>> AnalyzedAsync(CommunityLeadDb db, RepairScope scope, int afterId, int take, CancellationToken ct)
    {
        var kits = db.Kits.AsNoTracking().Where(k => k.State == KitState.Analyzed && k.Id > afterId);
        if (scope.BatchKey is { } batch) kits = kits.Where(k => db.LabResults.Any(r => r.KitId == k.Id && r.LabBatchId == batch));
        return kits.OrderBy(k => k.Id).Take(take).Select(k => new DueKit(k.Id, k.Code, k.Version)).ToListAsync(ct);
    }

    /// <summary>
    /// Interpreted kits with a result in effect that came into effect after their interpretation was made, and whose
    /// figures differ from those the interpretation used (a correction that only restates them changes nothing).
    /// </summary>
    public static async Task<List<DueKit>> ChangedSinceInterpretedAsync(CommunityLeadDb db, RepairScope scope,
        JsonSerializerOptions json, CancellationToken ct)
    {
        var batches = db.LabBatches.Where(b => b.Status == BatchStatus.Accepted || b.Status == BatchStatus.Released);
        if (scope.BatchKey is { } key) batches = batches.Where(b => b.Id == key);
        if (scope.EffectiveSinceUtc is { } since)
            batches = batches.Where(b => (b.Status == BatchStatus.Accepted && b.PostedAtUtc >= since)
                                         || (b.Status == BatchStatus.Released && b.ReleasedAtUtc >= since));
        var candidates = await (
                from r in db.LabResults
                join b in batches on r.LabBatchId equals b.Id
                join i in db.Interpretations on r.KitId equals i.KitId
                join k in db.Kits on r.KitId equals k.Id
                where r.SupersededAtUtc == null && i.SupersededAtUtc == null && k.State == KitState.Interpreted
                      && ((b.Status == BatchStatus.Accepted && b.PostedAtUtc > i.CreatedAtUtc)
                          || (b.Status == BatchStatus.Released && b.ReleasedAtUtc > i.CreatedAtUtc))
                select new { KitId = k.Id, k.Code, k.Version, InterpretationId = i.Id })
            .Distinct().ToListAsync(ct);
        // Loaded a few hundred kits at a time: a store with many restating corrections can have thousands of candidates.
        var due = new List<DueKit>();
        foreach (var chunk in candidates.DistinctBy(c => c.KitId).OrderBy(c => c.KitId).Chunk(500))
        {
            var interpretationIds = chunk.Select(c => c.InterpretationId).ToList();
            var stored = await db.Interpretations.AsNoTracking().Where(i => interpretationIds.Contains(i.Id))
                .ToDictionaryAsync(i => i.KitId, i => i.OutcomeJson, ct);
            var facts = await KitFactsLoader.LoadAsync(db, [.. chunk.Select(c => c.KitId)], ct);
            due.AddRange(chunk
                .Where(c => !InterpretationBasis.MadeFrom(JsonSerializer.Deserialize<KitOutcome>(stored[c.KitId], json)!, facts[c.KitId].Results))
                .Select(c => new DueKit(c.KitId, c.Code, c.Version)));
        }
        return due;
    }
}
