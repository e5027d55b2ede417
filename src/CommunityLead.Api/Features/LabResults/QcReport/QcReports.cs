using System.Text.Json;
using CommunityLead.Api.Data;
using CommunityLead.Rules.Calibration;
using CommunityLead.Rules.LabResults;
using Microsoft.AspNetCore.Http.HttpResults;
using Microsoft.AspNetCore.Http.Json;
using Microsoft.EntityFrameworkCore;
using Microsoft.Extensions.Options;

namespace CommunityLead.Api.Features.LabResults.QcReport;

/// <summary>GET /api/lab/batches/{batchId}/qc-report: the latest version's run drawn for a person to look at.</summary>
public static class QcReports
{
    public static async Task<Results<FileContentHttpResult, ProblemHttpResult>> Get(
        string batchId, CommunityLeadDb db, IOptions<JsonOptions> json, IOptions<LabIntakeOptions> settings, CancellationToken ct)
    {
        var batch = await db.LabBatches.AsNoTracking().Where(b => b.BatchId == batchId).OrderByDescending(b => b.Version)
            .Select(b => new { b.BatchId, b.Version, b.Status, b.Method, b.AnalyzedAt, b.QcJson, b.RunJson })
            .FirstOrDefaultAsync(ct);
        if (batch is null) return BatchProblems.NotFound(batchId);
        var options = json.Value.SerializerOptions;
        var verdict = JsonSerializer.Deserialize<QcVerdict>(batch.QcJson, options)!;
        var run = batch.RunJson is null ? null : JsonSerializer.Deserialize<RunInput>(batch.RunJson, options);
        // The curves are fitted again from the stored run (the fit is deterministic); the verdict is the one stored at intake.
        var review = run is null ? null : RunReview.Evaluate(run, settings.Value.Qc);
        var report = new QcReportContent(batch.BatchId, batch.Version, batch.Status, batch.Method, batch.AnalyzedAt, verdict, run, review,
            settings.Value.Qc);
        return TypedResults.File(QcReportPdf.Render(report), "application/pdf", $"qc-report-{batch.BatchId}-v{batch.Version}.pdf");
    }
}

public sealed record QcReportContent(string BatchId, int Version, Data.Entities.BatchStatus Status, string Method,
    DateTimeOffset AnalyzedAt, QcVerdict Verdict, RunInput? Run, RunReview? Review, QcWindows Windows);
