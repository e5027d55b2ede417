using System.Text.Json;
using CommunityLead.Api.Auth;
using CommunityLead.Api.Data.Entities;
using CommunityLead.Rules.Calibration;
using CommunityLead.Rules.LabResults;

namespace CommunityLead.Api.Features.LabResults;

/// <summary>
/// Turns a checked batch into the rows stored for it, with the QC verdict computed here, not taken from the lab. The
/// batch's row and its QC come first; its results are made a chunk at a time as they are stored (<see cref="Result"/>).
/// </summary>
public static class BatchRecords
{
    public static LabBatch NewBatch(CheckedBatch batch, int version, string hash, string format, QcWindows windows,
        Actor actor, DateTime nowUtc, JsonSerializerOptions json)
    {
        var verdict = QcEvaluator.Evaluate([.. batch.Qc.Select(q => q.Sample)], batch.Tally.SampleCounts, batch.Tally.ReportingLimits, windows);
        // The lab's own run, checked here too: a failure (a sample above the calibrated range, say) holds the batch.
        if (batch.Run is { } run) verdict = RunReview.Evaluate(run, windows).Extend(verdict);
        return new LabBatch
        {
            BatchId = batch.BatchId,
            Version = version,
            CorrectionReason = batch.Correction ? batch.CorrectionReason?.Trim() : null,
            Method = batch.Method.Trim(),
            AnalyzedAt = batch.AnalyzedAt,
            AnalyzedAtUtc = batch.AnalyzedAt.UtcDateTime,
            ContentHash = hash,
            Format = format,
            Status = verdict.Passed ? BatchStatus.Accepted : BatchStatus.Held,
            QcJson = JsonSerializer.Serialize(verdict, json),
            RunJson = batch.Run is null ? null : JsonSerializer.Serialize(batch.Run, json),
            ResultCount = batch.Tally.ResultCount,
            PostedBy = actor.Label,
            PostedAtUtc = nowUtc,
            Qc = [.. batch.Qc.Select(q => new LabQcEntry
            {
                Type = q.Sample.Type, Analyte = q.Sample.Analyte, Expected = q.Sample.Expected, Measured = q.Sample.Measured,
                Unspiked = q.Sample.Unspiked, SpikeAdded = q.Sample.SpikeAdded, Duplicate = q.Sample.Duplicate, Unit = q.Unit,
            })],
        };
    }

    public static LabResult Result(CheckedResult r, int batchId, JsonSerializerOptions json) => new()
    {
        LabBatchId = batchId, KitId = r.KitId, KitCode = r.KitCode, Bottle = r.Bottle, Position = r.Row.Position, Location = r.Location,
        Analyte = r.Analyte, Value = r.Value, Unit = r.Unit,
        OriginalValue = r.Row.Value!.Value, OriginalUnit = r.Row.Unit!.Trim(),
        Qualifier = r.Row.Qualifier?.Trim().ToUpperInvariant() is { Length: > 0 } q ? q : null,
        Mdl = r.Mdl, ReportingLimit = r.ReportingLimit, Uncertainty = r.Uncertainty,
        ReplicatesJson = r.Replicates is null ? null : JsonSerializer.Serialize(r.Replicates),
        AcidifiedAt = r.AcidifiedAt, CollectedAt = r.CollectedAt,
        HoldingFlags = r.Holding.Count == 0 ? null : JsonSerializer.Serialize(r.Holding, json),
    };
}
