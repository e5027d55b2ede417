using System.Text.Json;
using CommunityLead.Api.Auth;
using CommunityLead.Api.Data;
using CommunityLead.Api.Data.Entities;
using CommunityLead.Api.Features.Interpretation;
using CommunityLead.Api.Infrastructure;
using FluentValidation;
using Microsoft.AspNetCore.Http.HttpResults;
using Microsoft.AspNetCore.Http.Json;
using Microsoft.EntityFrameworkCore;
using Microsoft.Extensions.Options;

namespace CommunityLead.Api.Features.LabResults;

/// <summary>
/// A coordinator may put a held batch into effect anyway, with a reason (for example, the lab explained the
/// failed check). Only the latest version can be released; the verdict stays on record as computed.
/// </summary>
public static class BatchReleasing
{
    public static async Task<Results<Ok<BatchOutcome>, ValidationProblem, ProblemHttpResult>> Release(
        string batchId, ReleaseRequest request, CommunityLeadDb db, IOptions<JsonOptions> json, TimeProvider clock,
        InterpretWithResults interpreting, HttpContext http, CancellationToken ct)
    {
        var batch = await db.LabBatches.Where(b => b.BatchId == batchId).OrderByDescending(b => b.Version).FirstOrDefaultAsync(ct);
        if (batch is null)
            return BatchProblems.NotFound(batchId);
        if (batch.Status != BatchStatus.Held)
            return TypedResults.Problem(statusCode: 409, title: "Only a held batch can be released.",
                detail: $"Batch {batchId} version {batch.Version} is {KebabEnum.Name(batch.Status)}.",
                // Not "status": that member of problem details is the HTTP status code.
                extensions: new Dictionary<string, object?> { ["batchStatus"] = KebabEnum.Name(batch.Status) });

        var now = clock.GetUtcNow().UtcDateTime;
        var actor = Actor.From(http.User);
        batch.Status = BatchStatus.Released;
        batch.ReleasedAtUtc = now;
        batch.ReleasedBy = actor.Label;
        batch.ReleaseReason = request.Reason!.Trim();
        db.AuditTrail.Add(Audit.Batch(actor, now, batchId, "release", KebabEnum.Name(BatchStatus.Released), batch.ReleaseReason,
            $"version {batch.Version}"));
        try
        {
            // The release, its effects and the interpretation they call for: one transaction, not cancellable.
            await interpreting.SaveAsync(actor, now, (store, interpret) => BatchEffects.ApplyStoredAsync(store, batch, actor, now, interpret));
        }
        catch (DbUpdateException e) when (StoreErrors.IsLostRace(e))
        {
            return BatchProblems.Raced(batchId, "Read the batch again: it may already be released.");
        }
        catch (BatchEffects.ConflictException e)
        {
            return e.Problem;
        }
        return TypedResults.Ok(await BatchViews.OutcomeAsync(db, batch, json.Value.SerializerOptions, forCoordinator: true, ct));
    }
}

public sealed class ReleaseValidator : AbstractValidator<ReleaseRequest>
{
    public ReleaseValidator() =>
        RuleFor(r => r.Reason).NotEmpty().WithMessage("Say why the held results may be used.").MinimumLength(3).MaximumLength(500);
}
