using CommunityLead.Api.Data;
using CommunityLead.Api.Data.Entities;
using CommunityLead.Api.Infrastructure;
using Microsoft.EntityFrameworkCore;

namespace CommunityLead.Api.Features.LabResults;

/// <summary>
/// A correction restates the whole batch. A row of the version it replaces that the correction leaves out
/// would stay current (nothing replaces it) while the lab believes it withdrew it, and the household's letter
/// would still be built on it; so such a correction is refused, naming every row left out.
/// </summary>
public static class BatchCorrections
{
    public static async Task<IReadOnlyList<BatchProblem>> RowsLeftOutAsync(CommunityLeadDb db, LabBatch replaced,
        CheckedBatch correction, CancellationToken ct)
    {
        var restated = correction.Results.Select(r => (r.KitId, r.Bottle, r.Row.Position, r.Location, r.Analyte)).ToHashSet();
        var earlier = await db.LabResults.AsNoTracking().Where(r => r.LabBatchId == replaced.Id).OrderBy(r => r.Id).ToListAsync(ct);
        return [.. earlier
            .Where(r => !restated.Contains((r.KitId, r.Bottle, r.Position, r.Location, r.Analyte)))
            .Select(r => new BatchProblem("", "results",
                $"Version {replaced.Version} reported {Describe(r)}. A correction restates every result of the batch, changed or " +
                "not, so include it. A result cannot be withdrawn by leaving it out; tell the program's coordinator."))];
    }

    private static string Describe(LabResult r)
    {
        var bottle = KebabEnum.Name(r.Bottle) + (r.Position is { } p ? $" {p}" : "") + (r.Location is { } l ? $" ({KebabEnum.Name(l)})" : "");
        return $"{KebabEnum.Name(r.Analyte)} for kit {r.KitCode}, {bottle}";
    }
}
