using System.Text.Json;
using CommunityLead.Api.Auth;
using CommunityLead.Api.Data;
using CommunityLead.Api.Data.Entities;
using CommunityLead.Api.Infrastructure;
using Microsoft.AspNetCore.Http.HttpResults;
using Microsoft.AspNetCore.Http.Json;
using Microsoft.EntityFrameworkCore;
using Microsoft.Extensions.Options;

namespace CommunityLead.Api.Features.LabResults;

public static class BatchQueries
{
    /// <summary>The latest version with its verdict and results, and every earlier version's summary.</summary>
    public static async Task<Results<Ok<BatchDetail>, ProblemHttpResult>> Get(
        string batchId, CommunityLeadDb db, IOptions<JsonOptions> json, HttpContext http, CancellationToken ct)
    {
        var versions = await db.LabBatches.AsNoTracking().Where(b => b.BatchId == batchId).OrderBy(b => b.Version).ToListAsync(ct);
        if (versions.Count == 0)
            return BatchProblems.NotFound(batchId);
        var latest = versions[^1];
        var options = json.Value.SerializerOptions;
        var results = await db.LabResults.AsNoTracking().Where(r => r.LabBatchId == latest.Id).OrderBy(r => r.Id).ToListAsync(ct);
        return TypedResults.Ok(new BatchDetail(
            await BatchViews.OutcomeAsync(db, latest, options, Actor.From(http.User).Is(Roles.Coordinator), ct),
            [.. versions.Select(v => new BatchVersion(v.Version, v.Status, v.PostedAtUtc, v.PostedBy, v.CorrectionReason, v.ContentHash))],
            [.. results.Select(r => new ResultView(r.KitCode, r.Bottle, r.Position, r.Location, r.Analyte, r.Value, r.Unit,
                r.OriginalValue, r.OriginalUnit, r.Qualifier, r.Mdl, r.ReportingLimit, r.Uncertainty,
                r.ReplicatesJson is null ? null : JsonSerializer.Deserialize<List<double>>(r.ReplicatesJson),
                [.. BatchViews.Holding(r.HoldingFlags, options).Select(f => KebabEnum.Name(f.Code))],
                latest.InEffect && r.SupersededAtUtc is null))]));
    }

    /// <summary>Newest first; status=held is the coordinator's list of batches waiting for a decision.</summary>
    public static async Task<Results<Ok<BatchList>, ValidationProblem>> List(
        CommunityLeadDb db, CancellationToken ct, string? status = null, int page = 1, int pageSize = 50)
    {
        var query = db.LabBatches.AsNoTracking();
        if (status is not null)
        {
            if (!KebabEnum.TryParse<BatchStatus>(status, out var wanted))
                return Problems.Field("status", $"Use one of: {KebabEnum.Allowed<BatchStatus>()}.");
            query = query.Where(b => b.Status == wanted);
        }
        if (Paging.Check(page, pageSize, largest: 200) is { } badPage) return badPage;
        var total = await query.CountAsync(ct);
        var items = await query.OrderByDescending(b => b.PostedAtUtc).ThenByDescending(b => b.Id)
            .Skip((page - 1) * pageSize).Take(pageSize)
            .Select(b => new BatchListItem(b.BatchId, b.Version, b.Status, b.Method, b.AnalyzedAt, b.ResultCount,
                b.Status != BatchStatus.Held, b.PostedAtUtc))
            .ToListAsync(ct);
        return TypedResults.Ok(new BatchList(items, page, pageSize, total));
    }
}
