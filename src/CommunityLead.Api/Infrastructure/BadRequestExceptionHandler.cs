using System.Reflection;
using System.Text.Json;
using System.Text.RegularExpressions;
using Microsoft.AspNetCore.Diagnostics;
using Microsoft.AspNetCore.Http.Metadata;

namespace CommunityLead.Api.Infrastructure;

/// <summary>
/// Turns what minimal APIs reject before a handler runs (malformed JSON, a wrong type or enum value, a
/// missing body, a query value of the wrong type) into problem details that name the field, instead of a
/// bare 400. (A wrong content type never gets here: routing answers it with a 415 problem of its own.)
/// </summary>
public sealed partial class BadRequestExceptionHandler(IProblemDetailsService problems) : IExceptionHandler
{
    public async ValueTask<bool> TryHandleAsync(HttpContext context, Exception exception, CancellationToken ct)
    {
        if (exception is not BadHttpRequestException bad) return false;
        context.Response.StatusCode = bad.StatusCode;
        var problem = new HttpValidationProblemDetails { Status = bad.StatusCode };
        if (bad.InnerException is JsonException json)
        {
            // Well-formed JSON with a value of the wrong form is a field problem, not broken JSON.
            problem.Title = json.Message.Contains("could not be converted", StringComparison.Ordinal) || OwnMessage(json)
                ? "The request has invalid fields."
                : "The request body is not valid JSON for this request.";
            problem.Errors[FieldPath.FromJsonPath(json.Path)] = [Explain(json, FieldType(context, json.Path))];
        }
        else if (NoBody().IsMatch(bad.Message))
        {
            problem.Title = "The request needs a JSON body.";
            problem.Errors["body"] = ["Send the request's fields as a JSON object."];
        }
        else if (WrongValue().Match(bad.Message) is { Success: true } wrong)
        {
            problem.Title = "The request has invalid fields.";
            problem.Errors[wrong.Groups["name"].Value] = [$"'{wrong.Groups["value"].Value}' is not a valid value here."];
        }
        else if (Missing().Match(bad.Message) is { Success: true } missing)
        {
            problem.Title = "The request has invalid fields.";
            problem.Errors[missing.Groups["name"].Value] = ["This value is required."];
        }
        else
        {
            problem.Title = bad.StatusCode == StatusCodes.Status415UnsupportedMediaType
                ? "Send the body as application/json."
                : "The request could not be read.";
            problem.Detail = bad.Message;
        }
        return await problems.TryWriteAsync(new ProblemDetailsContext
        {
            HttpContext = context, ProblemDetails = problem, Exception = exception,
        });
    }

    private static bool OwnMessage(JsonException json) =>
        json.Message is OffsetRequiredConverter.Message or NoNulText.Message or FiniteNumbers.Message;

    // Our own converters throw messages written for people; System.Text.Json's own ones mention .NET types.
    internal static string Explain(JsonException json, Type? fieldType)
    {
        var message = json.Message;
        if (OwnMessage(json)) return message;
        if (message.Contains("could not be mapped", StringComparison.Ordinal)) return "This field is not part of the request.";
        if (!message.Contains("could not be converted", StringComparison.Ordinal)) return "The JSON is malformed here.";
        // For records (all our requests) the message names the record, not the field's type: find it by the path.
        var enumType = fieldType is { IsEnum: true }
            ? fieldType
            : ContractEnums.FirstOrDefault(t => message.Contains(t.FullName!, StringComparison.Ordinal));
        if (enumType is not null)
            return $"Use one of: {string.Join(", ", Enum.GetNames(enumType).Select(JsonNamingPolicy.KebabCaseLower.ConvertName))}.";
        return (Nullable.GetUnderlyingType(fieldType ?? typeof(object)) ?? fieldType) switch
        {
            { } t when t == typeof(Guid) => "Use an id as the service gave it, like 3f2a9c1e-4b5d-4e6f-8a7b-9c0d1e2f3a4b.",
            { } t when t == typeof(int) || t == typeof(long) => "Use a whole number, without quotes.",
            { } t when t == typeof(double) || t == typeof(decimal) => "Use a number with a decimal point, without quotes.",
            { } t when t == typeof(bool) => "Use true or false, without quotes.",
            { } t when t == typeof(string) => "Use text in double quotes.",
            _ => "This value has the wrong type.",
        };
    }

    /// <summary>The .NET type of the field at a JSON path ("$.samples[0].bottle") of the endpoint's request body.</summary>
    private static Type? FieldType(HttpContext context, string? jsonPath)
    {
        // The exception handler middleware clears the endpoint before handlers run; its feature keeps it.
        var endpoint = context.Features.Get<IExceptionHandlerFeature>()?.Endpoint ?? context.GetEndpoint();
        var type = endpoint?.Metadata.GetMetadata<IAcceptsMetadata>()?.RequestType;
        if (type is null || string.IsNullOrEmpty(jsonPath)) return null;
        foreach (Match step in PathStep().Matches(jsonPath))
        {
            var property = type.GetProperty(step.Groups["name"].Value, BindingFlags.Public | BindingFlags.Instance | BindingFlags.IgnoreCase);
            type = property?.PropertyType;
            for (var i = 0; i < step.Groups["index"].Captures.Count && type is not null; i++) type = ElementType(type);
            if (type is null) return null;
        }
        return Nullable.GetUnderlyingType(type) ?? type;
    }

    private static Type? ElementType(Type type) =>
        type.IsArray ? type.GetElementType()
        : type.GetInterfaces().Append(type)
            .FirstOrDefault(i => i.IsGenericType && i.GetGenericTypeDefinition() == typeof(IEnumerable<>))?.GetGenericArguments()[0];

    private static readonly Type[] ContractEnums =
        [.. typeof(CommunityLead.Rules.Kits.KitKind).Assembly.GetTypes().Where(t => t.IsEnum && t.IsPublic)];

    [GeneratedRegex(@"\.(?<name>\w+)(?:\[(?<index>\d+)\])*")]
    private static partial Regex PathStep();

    // "Implicit body inferred for parameter "request" but no body was provided." and its explicit-[FromBody] twin.
    [GeneratedRegex(@"^(Implicit body inferred for parameter|Required parameter "".*"" was not provided from body)")]
    private static partial Regex NoBody();

    // "Failed to bind parameter "int page" from "abc"."
    [GeneratedRegex(@"^Failed to bind parameter ""(?:[^""]* )?(?<name>\w+)"" from ""(?<value>.*)""\.$")]
    private static partial Regex WrongValue();

    // "Required parameter "int page" was not provided from query string."
    [GeneratedRegex(@"^Required parameter ""(?:[^""]* )?(?<name>\w+)"" was not provided")]
    private static partial Regex Missing();
}
