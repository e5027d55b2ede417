using CommunityLead.Rules.Kits;
using Microsoft.AspNetCore.Http.HttpResults;

namespace CommunityLead.Api.Infrastructure;

/// <summary>Expected failures as RFC 9457 problem details, worded for the person who will read them.</summary>
public static class Problems
{
    public static ProblemHttpResult HouseholdNotFound(Guid id) =>
        TypedResults.Problem(statusCode: 404, title: "No such household.", detail: $"No household has the id {id}.");

    public static ProblemHttpResult KitNotFound(string code) =>
        TypedResults.Problem(statusCode: 404, title: "No such kit.",
            detail: $"The code {code} is well formed, but no kit with it was issued here.");

    public static ValidationProblem Field(string field, string message, string title = "The request has invalid fields.") =>
        TypedResults.ValidationProblem(new Dictionary<string, string[]> { [field] = [message] }, title: title);

    public static ValidationProblem Fields(IDictionary<string, string[]> errors) =>
        TypedResults.ValidationProblem(errors, title: "The request has invalid fields.");

    /// <summary>409 for a move the kit's state does not allow, with what is allowed instead.</summary>
    public static ProblemHttpResult IllegalMove(string code, KitState current, KitAction attempted) =>
        TypedResults.Problem(statusCode: 409, title: "This kit cannot do that now.",
            detail: $"Kit {code} is {KebabEnum.Name(current)}; '{KebabEnum.Name(attempted)}' is not allowed from there.",
            extensions: new Dictionary<string, object?>
            {
                ["currentState"] = KebabEnum.Name(current),
                ["allowedActions"] = KitLifecycle.AllowedActions(current).Select(KebabEnum.Name).ToArray(),
            });

    public static ProblemHttpResult ChangedMeanwhile(string code) =>
        TypedResults.Problem(statusCode: 409, title: "The kit changed while this request was handled.",
            detail: $"Someone else changed kit {code} at the same moment. Read it again and retry.");
}
