using System.Text.Json;
using CommunityLead.Api.Auth;
using CommunityLead.Api.Data;
using CommunityLead.Api.Data.Entities;
using CommunityLead.Api.Features.Interpretation;
using CommunityLead.Api.Features.Operations;
using CommunityLead.Api.Infrastructure;
using CommunityLead.Rules.LabResults;
using Microsoft.AspNetCore.Http.Features;
using Microsoft.AspNetCore.Http.HttpResults;
using Microsoft.AspNetCore.Http.Json;
using Microsoft.EntityFrameworkCore;
using Microsoft.Extensions.Options;
using Microsoft.Net.Http.Headers;

namespace CommunityLead.Api.Features.LabResults;

/// <summary>Everything intake needs besides the batch, gathered once per request (and by the demo loader).</summary>
public sealed record BatchIntakeContext(CommunityLeadDb Db, LabIntakeOptions Options, JsonSerializerOptions JsonOptions, TimeProvider Clock,
    InterpretWithResults Interpreting, InterpretationRepair Repair, Actor Actor);

/// <summary>
/// POST /api/lab/batches: read (JSON or CSV, streamed, size-limited), check everything, then either refuse the
/// whole batch (422, nothing written) or store it in one transaction with its computed QC verdict.
/// The same batch posted again is answered with the original outcome; changed content needs a correction.
/// </summary>
public static class BatchIntake
{
    public static async Task<Results<Created<BatchOutcome>, Ok<BatchOutcome>, ProblemHttpResult>> Post(
        HttpContext http, CommunityLeadDb db, IOptions<LabIntakeOptions> settings, IOptions<JsonOptions> json,
        TimeProvider clock, InterpretWithResults interpreting, InterpretationRepair repair, CancellationToken ct)
    {
        var options = settings.Value;
        var jsonOptions = json.Value.SerializerOptions;
        if (http.Request.ContentLength > options.MaxBatchBytes) return BatchProblems.TooLarge(options.MaxBatchBytes);
        // Kestrel's own body limit (30 MB by default) would otherwise cut in first, whatever the setting says;
        // the size-limited stream below enforces LabIntake:MaxBatchBytes instead.
        if (http.Features.Get<IHttpMaxRequestBodySizeFeature>() is { IsReadOnly: false } serverLimit)
            serverLimit.MaxRequestBodySize = null;
        MediaTypeHeaderValue.TryParse(http.Request.ContentType, out var mediaType);
        var intake = new BatchIntakeContext(db, options, jsonOptions, clock, interpreting, repair, Actor.From(http.User));
        Results<Created<BatchOutcome>, Ok<BatchOutcome>, ProblemHttpResult> outcome;
        try
        {
            var body = new SizeLimitedStream(http.Request.Body, options.MaxBatchBytes);
            var problems = new BatchProblemList(options.MaxProblemsListed);
            switch (mediaType?.MediaType.Value?.ToLowerInvariant())
            {
                case "application/json":
                    var parsed = await JsonBatchReader.ReadAsync(body, jsonOptions, problems, ct);
                    outcome = await IngestAsync(parsed, intake, ct);
                    break;
                // Checked while it is read: a CSV batch of any size is never held whole (CsvIntake).
                case "text/csv": outcome = await CsvIntake.IngestAsync(body, http.Request.Query, problems, intake, ct); break;
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

        switch (outcome.Result)
        {
            case Created<BatchOutcome> { Value: { } stored }: ServiceMetrics.BatchStored(stored.Status, stored.ResultCount); break;
            case ProblemHttpResult { StatusCode: StatusCodes.Status422UnprocessableEntity }: ServiceMetrics.BatchRefused(); break;
        }
        return outcome;
    }

    /// <summary>
    /// Everything after reading a whole batch (JSON): checks, idempotency, QC, effects and interpretation in one
    /// transaction. Also used by the demo loader, so demo batches take exactly the path a lab's do.
    /// <paramref name="ct"/> stops it only until writing begins.
    /// </summary>
    public static async Task<Results<Created<BatchOutcome>, Ok<BatchOutcome>, ProblemHttpResult>> IngestAsync(ParsedBatch parsed,
        BatchIntakeContext intake, CancellationToken ct)
    {
        // A repeat is recognised before the checks: a retry must get the original outcome even when its kits
        // have moved on since (closed, say), which the checks would now refuse.
        var hash = ContentHash(parsed.Request, intake.JsonOptions);
        var latest = parsed.Problems.Count == 0 ? await LatestAsync(intake.Db, parsed.Request.BatchId, ct) : null;
        if (latest?.ContentHash == hash) return await ReplayAsync(latest, intake);

        var (batch, problems) = await new BatchChecker(intake.Db, intake.Options, intake.Clock).CheckAsync(parsed, ct);
        if (batch is null) return BatchProblems.Unprocessable(problems);
        return await StoreAsync(batch, latest, hash, parsed.Format, intake, ct);
    }

    internal static Task<LabBatch?> LatestAsync(CommunityLeadDb db, string? batchId, CancellationToken ct) => batchId is null
        ? Task.FromResult<LabBatch?>(null)
        : db.LabBatches.AsNoTracking().Where(b => b.BatchId == batchId).OrderByDescending(b => b.Version).FirstOrDefaultAsync(ct);

    /// <summary>
    /// A lab posts again when its first post timed out. Results stored before they shared a transaction with
    /// interpretation may have been left uninterpreted then: this batch's kits are repaired now rather than at the
    /// next sweep. On a sound store this finds nothing and writes nothing.
    /// </summary>
    internal static async Task<Results<Created<BatchOutcome>, Ok<BatchOutcome>, ProblemHttpResult>> ReplayAsync(LabBatch latest,
        BatchIntakeContext intake)
    {
        if (latest.InEffect) await intake.Repair.RepairAsync(new RepairScope(BatchKey: latest.Id), CancellationToken.None);
        return TypedResults.Ok(await BatchViews.OutcomeAsync(intake.Db, latest, intake.JsonOptions, forCoordinator: false, CancellationToken.None));
    }

    /// <summary>A checked batch that is no repeat: a new batch, or a new version of one (a correction), in one transaction.</summary>
    internal static async Task<Results<Created<BatchOutcome>, Ok<BatchOutcome>, ProblemHttpResult>> StoreAsync(CheckedBatch batch,
        LabBatch? latest, string hash, string format, BatchIntakeContext intake, CancellationToken ct)
    {
        var (db, options, actor) = (intake.Db, intake.Options, intake.Actor);
        if (latest is not null && !batch.Correction) return BatchProblems.ChangedContent(batch.BatchId, latest.Version);
        if (latest is null && batch.Correction)
            return BatchProblems.Unprocessable([new("", "correction", $"There is no batch {batch.BatchId} to correct.")]);
        if (latest is not null && await BatchCorrections.RowsLeftOutAsync(db, batch.BatchId, batch, ct) is { Count: > 0 } leftOut)
            return BatchProblems.Unprocessable(leftOut);

        var now = intake.Clock.GetUtcNow().UtcDateTime;
        var entity = BatchRecords.NewBatch(batch, (latest?.Version ?? 0) + 1, hash, format, options.Qc, actor, now, intake.JsonOptions);
        // The batch's own row goes through the context; its QC and result rows are inserted in bulk once it has its key,
        // the results a chunk at a time as they are handed out (a CSV batch's are read again from its spooled file).
        var qc = entity.Qc;
        entity.Qc = [];
        db.LabBatches.Add(entity);
        db.AuditTrail.Add(Audit.Batch(actor, now, entity.BatchId, batch.Correction ? "post-correction" : "post",
            KebabEnum.Name(entity.Status), entity.CorrectionReason,
            $"version {entity.Version}, {entity.ResultCount} results, {format}, QC {(entity.Status == BatchStatus.Held ? "failed" : "passed")}"));
        try
        {
            await intake.Interpreting.SaveAsync(actor, now, async (store, interpret) =>
            {
                foreach (var row in qc) row.LabBatchId = entity.Id;
                await BulkInsert.InsertAsync(store, qc);
                await batch.Results.ForEachChunkAsync(chunk =>
                    BulkInsert.InsertAsync(store, [.. chunk.Select(r => BatchRecords.Result(r, entity.Id, intake.JsonOptions))]));
                if (entity.InEffect) await BatchEffects.ApplyStoredAsync(store, entity, actor, now, interpret);
            });
        }
        catch (DbUpdateException e) when (StoreErrors.IsLostRace(e))
        {
            // Another post of this batch id won the race, or a kit changed meanwhile: nothing of ours was written.
            return BatchProblems.Raced(batch.BatchId);
        }
        catch (BatchEffects.ConflictException e)
        {
            return e.Problem;
        }
        return TypedResults.Created($"/api/lab/batches/{Uri.EscapeDataString(entity.BatchId)}",
            await BatchViews.OutcomeAsync(db, entity, intake.JsonOptions, forCoordinator: false, ct));
    }

    /// <summary>Hash of what the lab reported, without the correction note, so a repeated correction is recognised too.</summary>
    internal static string ContentHash(BatchRequest request, JsonSerializerOptions options) => BatchHash.Of(request, options);
}
