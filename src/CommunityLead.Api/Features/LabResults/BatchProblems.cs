using Microsoft.AspNetCore.Http.HttpResults;

namespace CommunityLead.Api.Features.LabResults;

/// <summary>The ways a batch is refused, each as problem details the lab's staff can act on.</summary>
public static class BatchProblems
{
    /// <summary>
    /// 422 with the first problems (setting LabIntake:MaxProblemsListed) and the count of all: <c>errors</c> keyed
    /// "/results/3/unit" (JSON pointer) or "row 5/unit" (CSV line, header = line 1) holds each reason, and
    /// <c>problems</c> the same problems in file order with row and field apart and the <c>key</c> to their reason.
    /// The reason is said once, in <c>errors</c>, because that is the contract's field (API.md) and what every
    /// problem-details reader and our other routes use; <c>problems</c> keeps its place, order, row and field for
    /// the labs' tools that walk it, and no longer repeats the text, which once doubled a large answer.
    /// </summary>
    public static ProblemHttpResult Unprocessable(BatchProblemList problems)
    {
        var listed = problems.Listed;
        var errors = listed.GroupBy(p => p.Key).ToDictionary(g => g.Key, g => g.Select(p => p.Reason).ToArray());
        var cut = listed.Count < problems.Count;
        var details = new HttpValidationProblemDetails(errors)
        {
            Status = StatusCodes.Status422UnprocessableEntity,
            Title = "The batch was refused; nothing was stored.",
            Detail = $"{problems.Count:N0} problem(s). Fix them and post the whole batch again.",
            Extensions =
            {
                ["problems"] = listed.Select(p => new { row = p.Where.Length == 0 ? null : p.Where, field = p.Field, key = p.Key }).ToArray(),
                ["problemCount"] = problems.Count,
                ["problemsListed"] = listed.Count,
            },
        };
        if (cut)
            details.Extensions["note"] = $"Only the first {listed.Count:N0} of {problems.Count:N0} problems are listed. " +
                "Fix these (often one mistake repeated on every row) and post the batch again to see any others.";
        return TypedResults.Problem(details);
    }

    public static ProblemHttpResult Unprocessable(IEnumerable<BatchProblem> problems) => Unprocessable(BatchProblemList.Of(problems));

    public static ProblemHttpResult NotFound(string batchId) =>
        TypedResults.Problem(statusCode: StatusCodes.Status404NotFound, title: "No such batch.", detail: $"No batch {batchId} was posted.");

    public static ProblemHttpResult TooLarge(long limit) =>
        TypedResults.Problem(statusCode: StatusCodes.Status413PayloadTooLarge, title: "The batch is too large.",
            detail: $"Batches may be up to {limit:N0} bytes (setting LabIntake:MaxBatchBytes). Split it into several batches.");

    public static ProblemHttpResult UnsupportedType() =>
        TypedResults.Problem(statusCode: StatusCodes.Status415UnsupportedMediaType, title: "Send the batch as application/json or text/csv.");

    public static ProblemHttpResult ChangedContent(string batchId, int version) =>
        TypedResults.Problem(statusCode: StatusCodes.Status409Conflict, title: "This batch id was already posted with other content.",
            detail: $"Batch {batchId} version {version} holds different results. To replace them, post it as a correction " +
                    "(\"correction\": true and a \"correctionReason\"; in CSV, ?correction=true&correctionReason=...).",
            extensions: new Dictionary<string, object?> { ["batchId"] = batchId, ["currentVersion"] = version });

    /// <param name="retry">What to do again, in the words of the request that lost ("Post it again.").</param>
    public static ProblemHttpResult Raced(string batchId, string retry = "Post it again.") =>
        TypedResults.Problem(statusCode: StatusCodes.Status409Conflict, title: "The batch changed while this request was handled.",
            detail: $"Batch {batchId} or one of its kits was changed by another request at the same moment. {retry}");
}
