using System.Text;
using System.Text.Json.Nodes;
using CommunityLead.Api.Auth;
using CommunityLead.Api.Data;
using CommunityLead.Api.Features.LabResults;
using CommunityLead.Api.Infrastructure;
using CommunityLead.Tests.Infrastructure;
using Microsoft.AspNetCore.Http.Json;
using Microsoft.EntityFrameworkCore;
using Microsoft.Extensions.DependencyInjection;
using Microsoft.Extensions.Options;

namespace CommunityLead.Tests.Features.Interpretation;

/// <summary>
/// Writes a lab batch the way the intake did before results and interpretation shared one transaction, and stops
/// where a client that disconnected, or a process killed, stopped it then: the batch and its results committed,
/// the kits moved to analyzed, nothing interpreted and no attention item raised. It runs the intake's own steps
/// (reader, checker, records, effects, one save); only the interpretation that used to follow is missing.
/// </summary>
internal static class UninterpretedResults
{
    private static readonly Actor Lab = new("partner-lab", Roles.Lab);

    public static async Task CommitAsync(CommunityLeadFactory app, JsonObject batch)
    {
        await using var scope = app.Services.CreateAsyncScope();
        var services = scope.ServiceProvider;
        var db = services.GetRequiredService<CommunityLeadDb>();
        var json = services.GetRequiredService<IOptions<JsonOptions>>().Value.SerializerOptions;
        var options = services.GetRequiredService<IOptions<LabIntakeOptions>>().Value;
        var clock = services.GetRequiredService<TimeProvider>();

        var parsed = await JsonBatchReader.ReadAsync(new MemoryStream(Encoding.UTF8.GetBytes(batch.ToJsonString())), json, new BatchProblemList(options.MaxProblemsListed), default);
        var (checkedBatch, problems) = await new BatchChecker(db, options, clock).CheckAsync(parsed, default);
        Assert.True(checkedBatch is not null, string.Join("; ", problems.Listed.Select(p => $"{p.Where}/{p.Field}: {p.Reason}")));
        var now = clock.GetUtcNow().UtcDateTime;
        var entity = BatchRecords.NewBatch(checkedBatch, 1, BatchIntake.ContentHash(parsed.Request, json), parsed.Format, options.Qc,
            Lab, now, json);
        db.LabBatches.Add(entity);
        db.AuditTrail.Add(Audit.Batch(Lab, now, entity.BatchId, "post", KebabEnum.Name(entity.Status), null,
            $"version 1, {entity.ResultCount} results, {parsed.Format}"));
        await using var transaction = await db.Database.BeginTransactionAsync();
        await db.SaveChangesAsync();
        await checkedBatch.Results.ForEachChunkAsync(chunk => BulkInsert.InsertAsync(db, [.. chunk.Select(r => BatchRecords.Result(r, entity.Id, json))]));
        // The kits move as at intake, but nothing is interpreted.
        await BatchEffects.ApplyStoredAsync(db, entity, Lab, now, _ => Task.CompletedTask);
        await transaction.CommitAsync();
    }
}
