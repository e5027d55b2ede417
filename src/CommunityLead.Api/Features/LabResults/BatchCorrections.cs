using CommunityLead.Api.Data;
using CommunityLead.Api.Data.Entities;
using CommunityLead.Api.Infrastructure;
using Microsoft.EntityFrameworkCore;

namespace CommunityLead.Api.Features.LabResults;

/// <summary>
/// A correction restates the batch. A result of this batch that is in effect now and that the correction leaves
/// out would stay current (nothing replaces it) while the lab believes it withdrew it, and the household's
/// letter would still be built on it; so such a correction is refused, naming every row left out.
/// Only rows the lab could restate count: results in effect (not held, not already replaced by a later batch)
/// for kits that still take results.
/// </summary>
public static class BatchCorrections
{
    public static async Task<IReadOnlyList<BatchProblem>> RowsLeftOutAsync(CommunityLeadDb db, string batchId,
        CheckedBatch correction, CancellationToken ct)
    {
        var restated = correction.Tally.Restated;
        var inEffect = await db.LabResults.AsNoTracking()
            .Where(r => r.Batch!.BatchId == batchId && r.SupersededAtUtc == null
                        && (r.Batch.Status == BatchStatus.Accepted || r.Batch.Status == BatchStatus.Released))
            .Join(db.Kits.Where(k => BatchChecker.AcceptingStates.Contains(k.State)), r => r.KitId, k => k.Id, (r, _) => r)
            .OrderBy(r => r.Id)
            .ToListAsync(ct);
        return [.. inEffect
            .Where(r => !restated.ContainsKey(new ResultKey(r.KitId, r.Bottle, r.Position, r.Location, r.Analyte)))
            .Select(r => new BatchProblem("", "results",
                $"{Describe(r)} is in effect from this batch. A correction restates every such result, changed or not, " +
                "so include it. Leaving it out would not withdraw it; to withdraw a result, tell the program's coordinator."))];
    }

    private static string Describe(LabResult r)
    {
        var bottle = KebabEnum.Name(r.Bottle) + (r.Position is { } p ? $" {p}" : "") + (r.Location is { } l ? $" ({KebabEnum.Name(l)})" : "");
        return $"The {KebabEnum.Name(r.Analyte)} result for kit {r.KitCode}, {bottle},";
    }
}
