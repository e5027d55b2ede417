namespace CommunityLead.Api.Features.LabResults;

/// <summary>
/// A CSV batch's passed results, read again from the spooled file and checked again a chunk at a time while they are
/// stored, so that no batch is held whole in memory (the checks kept only each row's key and run figures). The second
/// reading sees the same rows; what it checks against may have moved since (a kit closed by another request), in which
/// case nothing may be stored: <see cref="ChangedException"/> rolls the transaction back.
/// </summary>
public sealed class SpooledResults(Stream spool, BatchRequest header, BatchIntakeContext intake) : CheckedResults
{
    public override async Task ForEachChunkAsync(Func<IReadOnlyList<CheckedResult>, Task> each)
    {
        spool.Position = 0;
        var problems = new BatchProblemList(1);
        var checker = new BatchChecker(intake.Db, intake.Options, intake.Clock);
        checker.Begin(header, problems);
        await CsvBatchReader.ReadRowsAsync(spool, problems, async rows =>
        {
            var passed = await checker.AddResultsAsync(rows, CancellationToken.None);
            if (problems.Count > 0) throw new ChangedException(problems.Listed[0]);
            await each(passed);
        }, CancellationToken.None);
        if (problems.Count > 0) throw new ChangedException(problems.Listed[0]);
    }

    public sealed class ChangedException(BatchProblem problem) : Exception($"{problem.Where} {problem.Field}: {problem.Reason}");
}
