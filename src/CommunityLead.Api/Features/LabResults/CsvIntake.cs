using Microsoft.AspNetCore.Http.HttpResults;

namespace CommunityLead.Api.Features.LabResults;

/// <summary>
/// A text/csv batch, checked while it is read: each chunk of rows is hashed and checked and then let go, so memory
/// stays bounded however large the file (only QC rows, and results while the batch can still be accepted, are
/// kept). The outcome is the one a whole batch gets from <see cref="BatchIntake.IngestAsync"/>: a repeat is known by
/// its hash whatever the checks now say, a refusal lists the first problems, a good batch is stored.
/// </summary>
public static class CsvIntake
{
    public static async Task<Results<Created<BatchOutcome>, Ok<BatchOutcome>, ProblemHttpResult>> IngestAsync(Stream body,
        IQueryCollection query, BatchProblemList problems, BatchIntakeContext intake, CancellationToken ct)
    {
        var header = CsvBatchReader.ReadQuery(query, problems);
        var queryProblems = problems.Count;
        var checker = new BatchChecker(intake.Db, intake.Options, intake.Clock);
        checker.Begin(header, problems);
        using var hash = new BatchHash(header, intake.JsonOptions);
        var read = await CsvBatchReader.ReadRowsAsync(body, problems, async rows =>
        {
            hash.AddResults(rows);
            await checker.AddResultsAsync(rows, ct);
        }, ct);
        header = header with { Run = read.Run };
        var digest = hash.Finish(read.Qc, read.Run);

        // As for JSON: a repeat is recognised before the checks count, and only content that was read whole can be one.
        var latest = queryProblems + read.ReadingProblems == 0 ? await BatchIntake.LatestAsync(intake.Db, header.BatchId, ct) : null;
        if (latest?.ContentHash == digest) return await BatchIntake.ReplayAsync(latest, intake);
        if (checker.Finish(header, read.Qc) is not { } batch) return BatchProblems.Unprocessable(problems);
        return await BatchIntake.StoreAsync(batch, latest, digest, "csv", intake, ct);
    }
}
