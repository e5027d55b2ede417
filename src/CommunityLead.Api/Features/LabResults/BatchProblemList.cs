namespace CommunityLead.Api.Features.LabResults;

/// <summary>
/// The problems of a batch being checked: every one is counted, only the first <paramref name="limit"/> are kept
/// (setting LabIntake:MaxProblemsListed). A file of a million bad rows thus costs a counter, not a million
/// messages held in memory and sent back.
/// </summary>
public sealed class BatchProblemList(int limit)
{
    private readonly List<BatchProblem> listed = [];

    /// <summary>Every problem found, listed or not.</summary>
    public int Count { get; private set; }

    /// <summary>The first problems, in the order they were found (the file's order, row by row).</summary>
    public IReadOnlyList<BatchProblem> Listed => listed;

    public void Add(BatchProblem problem)
    {
        Count++;
        if (listed.Count < limit) listed.Add(problem);
    }

    public static BatchProblemList Of(IEnumerable<BatchProblem> problems)
    {
        var list = new BatchProblemList(int.MaxValue);
        foreach (var problem in problems) list.Add(problem);
        return list;
    }
}
