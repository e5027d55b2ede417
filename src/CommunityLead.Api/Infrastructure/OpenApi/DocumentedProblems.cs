namespace CommunityLead.Api.Infrastructure.OpenApi;

/// <summary>
/// The shapes of the problem details that carry more than RFC 9457's members, for the API description only: the
/// answers themselves are written by <see cref="Problems"/> and the batch checks, and tests read them back.
/// </summary>
public sealed record KitStateProblem(
    string? Type, string Title, int Status, string? Detail, string? Instance,
    string CurrentState,
    IReadOnlyList<string> AllowedActions);

/// <summary>
/// One problem of a refused lab batch, in file order: the row (a JSON pointer or "row 5", header = row 1), the
/// field, and the key in <c>errors</c> under which its reason is written.
/// </summary>
public sealed record BatchProblemEntry(string? Row, string Field, string Key);

/// <summary>A refused batch: the first problems (LabIntake:MaxProblemsListed), how many there are, and a note when the list is cut.</summary>
public sealed record BatchRefusedProblem(
    string? Type, string Title, int Status, string? Detail, string? Instance,
    IReadOnlyDictionary<string, string[]> Errors,
    IReadOnlyList<BatchProblemEntry> Problems,
    int ProblemCount,
    int ProblemsListed,
    string? Note);
