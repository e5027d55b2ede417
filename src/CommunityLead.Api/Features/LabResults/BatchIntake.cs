using System.Security.Cryptography;
using System.Text.Json;
using CommunityLead.Api.Auth;
using CommunityLead.Api.Data;
using CommunityLead.Api.Data.Entities;
using CommunityLead.Api.Infrastructure;
using CommunityLead.Rules.LabResults;
using Microsoft.AspNetCore.Http.HttpResults;
using Microsoft.AspNetCore.Http.Json;
using Microsoft.EntityFrameworkCore;
using Microsoft.Extensions.Options;
using Microsoft.Net.Http.Headers;

namespace CommunityLead.Api.Features.LabResults;

/// <summary>
/// POST /api/lab/batches: read (JSON or CSV, streamed, size-limited), check everything, then either refuse the
/// whole batch (422, nothing written) or store it in one transaction with its computed QC verdict.
/// The same batch posted again is answered with the original outcome; changed content needs a correction.
/// </summary>
public static class BatchIntake
{
    public static async Task<Results<Created<BatchOutcome>, Ok<BatchOutcome>, ProblemHttpResult>> Post(
        HttpContext http, CommunityLeadDb db, IOptions<LabIntakeOptions> settings, IOptions<JsonOptions> json,
        TimeProvider clock, CancellationToken ct)
    {
        var options = settings.Value;
        var jsonOptions = json.Value.SerializerOptions;
        if (http.Request.ContentLength > options.MaxBatchBytes) return BatchProblems.TooLarge(options.MaxBatchBytes);
        MediaTypeHeaderValue.TryParse(http.Request.ContentType, out var mediaType);
        ParsedBatch parsed;
        try
        {
            var body = new SizeLimitedStream(http.Request.Body, options.MaxBatchBytes);
            switch (mediaType?.MediaType.Value?.ToLowerInvariant())
            {
                case "application/json": parsed = await JsonBatchReader.ReadAsync(body, jsonOptions, ct); break;
                case "text/csv": parsed = await CsvBatchReader.ReadAsync(body, http.Request.Query, ct); break;
                default: return BatchProblems.UnsupportedType();
            }
        }
        catch (BodyTooLargeException)
        {
            return BatchProblems.TooLarge(options.MaxBatchBytes);
        }
        catch (JsonException e)
        {
            // The one exception handler words JSON errors with their path, as for every other request.
            throw new BadHttpRequestException("The batch is not valid JSON.", StatusCodes.Status400BadRequest, e);
        }

        var (batch, problems) = await new BatchChecker(db, options, clock).CheckAsync(parsed, ct);
        if (batch is null) return BatchProblems.Unprocessable(problems);

        var hash = ContentHash(parsed.Request, jsonOptions);
        var latest = await db.LabBatches.AsNoTracking().Where(b => b.BatchId == batch.BatchId)
            .OrderByDescending(b => b.Version).FirstOrDefaultAsync(ct);
        if (latest?.ContentHash == hash) return TypedResults.Ok(await BatchViews.OutcomeAsync(db, latest, jsonOptions, ct));
        if (latest is not null && !batch.Correction) return BatchProblems.ChangedContent(batch.BatchId, latest.Version);
        if (latest is null && batch.Correction)
            return BatchProblems.Unprocessable([new("", "correction", $"There is no batch {batch.BatchId} to correct.")]);

        var now = clock.GetUtcNow().UtcDateTime;
        var actor = Actor.From(http.User);
        var entity = BatchRecords.NewBatch(batch, (latest?.Version ?? 0) + 1, hash, parsed.Format, options.Qc, actor, now, jsonOptions);
        db.LabBatches.Add(entity);
        db.AuditTrail.Add(Audit.Batch(actor, now, entity.BatchId, batch.Correction ? "post-correction" : "post",
            KebabEnum.Name(entity.Status), entity.CorrectionReason,
            $"version {entity.Version}, {entity.ResultCount} results, {parsed.Format}, QC {(entity.Status == BatchStatus.Held ? "failed" : "passed")}"));
        if (entity.InEffect && await BatchEffects.ApplyAsync(db, entity, entity.Results, actor, now, ct) is { } illegal)
            return illegal;
        try
        {
            await db.SaveChangesAsync(ct);
        }
        catch (DbUpdateException)
        {
            // Another post of this batch id won the race, or a kit changed meanwhile: nothing of ours was written.
            return BatchProblems.Raced(batch.BatchId);
        }
        return TypedResults.Created($"/api/lab/batches/{Uri.EscapeDataString(entity.BatchId)}",
            await BatchViews.OutcomeAsync(db, entity, jsonOptions, ct));
    }

    /// <summary>Hash of what the lab reported, without the correction note, so a repeated correction is recognised too.</summary>
    private static string ContentHash(BatchRequest request, JsonSerializerOptions options) =>
        Convert.ToHexStringLower(SHA256.HashData(JsonSerializer.SerializeToUtf8Bytes(
            request with { Correction = null, CorrectionReason = null }, options)));
}
