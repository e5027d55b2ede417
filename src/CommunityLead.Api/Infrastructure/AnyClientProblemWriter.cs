using System.Diagnostics;
using Microsoft.AspNetCore.Http.Json;
using Microsoft.AspNetCore.WebUtilities;
using Microsoft.Extensions.Options;
using Microsoft.Net.Http.Headers;

namespace CommunityLead.Api.Infrastructure;

/// <summary>
/// Writes problem details also for a client that accepts anything. The framework's own writer answers only an
/// Accept header naming JSON, so curl (which sends <c>*/*</c>) got a bare 404, 405 or 415 with no word on what
/// went wrong. Registered before the framework's writer, it takes every request whose Accept is empty, names
/// JSON, or allows any type; one that asks only for something else (text/html, say) still gets the bare status.
/// </summary>
public sealed class AnyClientProblemWriter(IOptions<JsonOptions> json, IOptions<ProblemDetailsOptions> options) : IProblemDetailsWriter
{
    public bool CanWrite(ProblemDetailsContext context)
    {
        var accept = context.HttpContext.Request.Headers.Accept;
        if (accept.Count == 0) return true;
        if (!MediaTypeHeaderValue.TryParseList(accept, out var types)) return false;
        return types.Any(t => t.MatchesAllTypes
            || t.Type.Equals("application", StringComparison.OrdinalIgnoreCase)
               && (t.MatchesAllSubTypes || t.SubType.Equals("json", StringComparison.OrdinalIgnoreCase)
                   || t.SubType.Equals("problem+json", StringComparison.OrdinalIgnoreCase)));
    }

    public ValueTask WriteAsync(ProblemDetailsContext context)
    {
        var http = context.HttpContext;
        var problem = context.ProblemDetails;
        problem.Status ??= http.Response.StatusCode;
        problem.Title ??= Title(problem.Status.Value);
        problem.Type ??= Rfc9110Section(problem.Status.Value);
        problem.Extensions.TryAdd("traceId", Activity.Current?.Id ?? http.TraceIdentifier);
        options.Value.CustomizeProblemDetails?.Invoke(context);
        return new ValueTask(http.Response.WriteAsJsonAsync(problem, problem.GetType(), json.Value.SerializerOptions, "application/problem+json"));
    }

    /// <summary>RFC 9110 numbers its sections 15.5.1 (400) to 15.5.19 (418) and 15.6.1 (500) to 15.6.6 (505) in order.</summary>
    private static string? Rfc9110Section(int status) => status switch
    {
        >= 400 and <= 418 => $"https://tools.ietf.org/html/rfc9110#section-15.5.{status - 399}",
        >= 500 and <= 505 => $"https://tools.ietf.org/html/rfc9110#section-15.6.{status - 499}",
        _ => null,
    };

    /// <summary>What a status means to the person reading it; 415 says what the service takes.</summary>
    private static string Title(int status) => status switch
    {
        StatusCodes.Status415UnsupportedMediaType =>
            "Send the body as application/json (a lab batch may also be text/csv).",
        _ => ReasonPhrases.GetReasonPhrase(status),
    };
}
