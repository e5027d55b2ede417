using System.Text.Json;
using Microsoft.AspNetCore.Diagnostics;

namespace CommunityLead.Api.Infrastructure;

/// <summary>
/// Turns what minimal APIs reject before a handler runs (malformed JSON, a wrong type or enum value, a
/// missing body, a wrong content type) into problem details that name the field, instead of a bare 400.
/// </summary>
public sealed class BadRequestExceptionHandler(IProblemDetailsService problems) : IExceptionHandler
{
    public async ValueTask<bool> TryHandleAsync(HttpContext context, Exception exception, CancellationToken ct)
    {
        if (exception is not BadHttpRequestException bad) return false;
        context.Response.StatusCode = bad.StatusCode;
        var problem = new HttpValidationProblemDetails { Status = bad.StatusCode };
        switch (bad.InnerException)
        {
            case JsonException json:
                problem.Title = "The request body is not valid JSON for this request.";
                problem.Errors[FieldPath.FromJsonPath(json.Path)] = [Explain(json)];
                break;
            default:
                problem.Title = bad.StatusCode == StatusCodes.Status415UnsupportedMediaType
                    ? "Send the body as application/json."
                    : "The request could not be read.";
                problem.Detail = bad.Message;
                break;
        }
        return await problems.TryWriteAsync(new ProblemDetailsContext
        {
            HttpContext = context, ProblemDetails = problem, Exception = exception,
        });
    }

    // Our own converters throw messages written for people; System.Text.Json's own ones mention .NET types.
    private static string Explain(JsonException json)
    {
        var message = json.Message;
        if (message.StartsWith("Times need", StringComparison.Ordinal)) return message;
        if (message.Contains("could not be mapped", StringComparison.Ordinal)) return "This field is not part of the request.";
        if (!message.Contains("could not be converted", StringComparison.Ordinal)) return "The JSON is malformed here.";
        var enumType = ContractEnums.FirstOrDefault(t => message.Contains(t.FullName!, StringComparison.Ordinal));
        return enumType is null
            ? "This value has the wrong type."
            : $"Use one of: {string.Join(", ", Enum.GetNames(enumType).Select(JsonNamingPolicy.KebabCaseLower.ConvertName))}.";
    }

    private static readonly Type[] ContractEnums =
        [.. typeof(CommunityLead.Rules.Kits.KitKind).Assembly.GetTypes().Where(t => t.IsEnum && t.IsPublic)];
}
