using Microsoft.AspNetCore.Http.HttpResults;

namespace CommunityLead.Api.Features.LabResults;

/// <summary>
/// A text/csv batch. The body is spooled to a temporary file (deleted when the request ends), checked while it is
/// read from there a chunk at a time, and, if it passes, read again chunk by chunk while it is stored
/// (<see cref="SpooledResults"/>): memory stays bounded however large the file, since the checks keep only what the
/// QC verdict and a correction need (<see cref="BatchTally"/>). The outcome is the one a whole batch gets from
/// <see cref="BatchIntake.IngestAsync"/>: a repeat is known by its hash whatever the checks now say, a refusal lists
/// the first problems, a good batch is stored.
/// </summary>
public static class CsvIntake
{
    public static async Task<Results<Created<BatchOutcome>, Ok<BatchOutcome>, ProblemHttpResult>> IngestAsync(Stream body,
        IQueryCollection query, BatchProblemList problems, BatchIntakeContext intake, CancellationToken ct)
    {
        await using var spool = new FileStream(Path.Combine(Path.GetTempPath(), $"communitylead-batch-{Guid.NewGuid():N}.csv"),
            FileMode.CreateNew, FileAccess.ReadWrite, FileShare.None, 64 * 1024, FileOptions.DeleteOnClose | FileOptions.Asynchronous);
        await body.CopyToAsync(spool, ct);
        spool.Position = 0;

        var header = CsvBatchReader.ReadQuery(query, problems);
        var queryProblems = problems.Count;
        var checker = new BatchChecker(intake.Db, intake.Options, intake.Clock);
        checker.Begin(header, problems);
        using var hash = new BatchHash(header, intake.JsonOptions);
        var read = await CsvBatchReader.ReadRowsAsync(spool, problems, async rows =>
        {
            hash.AddResults(rows);
            await checker.AddResultsAsync(rows, ct);
        }, ct);
        header = header with { Run = read.Run };
        var digest = hash.Finish(read.Qc, read.Run);

        // As for JSON: a repeat is recognised before the checks count, and only content that was read whole can be one.
        var latest = queryProblems + read.ReadingProblems == 0 ? await BatchIntake.LatestAsync(intake.Db, header.BatchId, ct) : null;
        if (latest?.ContentHash == digest) return await BatchIntake.ReplayAsync(latest, intake);
        try
        {
            if (await checker.FinishAsync(header, read.Qc, new SpooledResults(spool, header, intake)) is not { } batch)
                return BatchProblems.Unprocessable(problems);
            return await BatchIntake.StoreAsync(batch, latest, digest, "csv", intake, ct);
        }
        catch (SpooledResults.ChangedException)
        {
            // A kit changed between the checks and a later reading (closed, say): nothing was written; posting again checks afresh.
            return BatchProblems.Raced(header.BatchId!);
        }
    }
}
