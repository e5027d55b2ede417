using Microsoft.AspNetCore.Http.HttpResults;
using Microsoft.Extensions.Primitives;

namespace CommunityLead.Api.Features.Households;

/// <summary>A household's version as an HTTP entity tag (RFC 9110 §8.8.3) and the If-Match check (§13.1.1).</summary>
public static class HouseholdVersions
{
    public static string ETag(int version) => $"\"{version}\"";

    /// <summary>No If-Match, "*", or one of the listed tags equal to the current one (weak tags compare too).</summary>
    public static bool Matches(StringValues ifMatch, int version)
    {
        if (StringValues.IsNullOrEmpty(ifMatch)) return true;
        var current = ETag(version);
        return ifMatch.SelectMany(v => (v ?? "").Split(',', StringSplitOptions.TrimEntries | StringSplitOptions.RemoveEmptyEntries))
            .Any(tag => tag == "*" || (tag.StartsWith("W/", StringComparison.Ordinal) ? tag[2..] : tag) == current);
    }

    public static ProblemHttpResult Stale(HttpContext http, int? version)
    {
        if (version is { } v) http.Response.Headers.ETag = ETag(v);
        return TypedResults.Problem(statusCode: StatusCodes.Status412PreconditionFailed,
            title: "The household was changed since you read it.",
            detail: "Someone else saved changes to this household. Read it again, then make your edit on the new details.");
    }
}
