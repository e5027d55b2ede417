using FluentValidation;

namespace CommunityLead.Api.Infrastructure;

/// <summary>
/// The one validation filter, set on each route group: every argument whose type has a FluentValidation
/// validator is checked before the handler runs, so an invalid request never reaches the database.
/// </summary>
public sealed class ValidationFilter : IEndpointFilter
{
    public async ValueTask<object?> InvokeAsync(EndpointFilterInvocationContext context, EndpointFilterDelegate next)
    {
        foreach (var argument in context.Arguments)
        {
            if (argument is null) continue;
            // Fields that did not even read (IReadFieldByField) come first; the validator's word on such a field
            // ("required", since it was left out) would only repeat it.
            var errors = argument is IReadFieldByField { ReadProblems: { } unread } ? new Dictionary<string, string[]>(unread) : [];
            var validatorType = typeof(IValidator<>).MakeGenericType(argument.GetType());
            if (context.HttpContext.RequestServices.GetService(validatorType) is IValidator validator)
            {
                var result = await validator.ValidateAsync(new ValidationContext<object>(argument), context.HttpContext.RequestAborted);
                foreach (var field in result.Errors.GroupBy(e => FieldPath.ToJson(e.PropertyName)).Where(g => !errors.ContainsKey(g.Key)))
                    errors[field.Key] = [.. field.Select(e => e.ErrorMessage).Distinct()];
            }
            if (errors.Count > 0) return TypedResults.ValidationProblem(errors, title: "The request has invalid fields.");
        }
        return await next(context);
    }
}

public static class FieldPath
{
    /// <summary>"Samples[0].CollectedAt" → "samples[0].collectedAt", the way the client wrote it.</summary>
    public static string ToJson(string propertyPath) =>
        string.Join('.', propertyPath.Split('.').Select(p => p.Length == 0 ? p : char.ToLowerInvariant(p[0]) + p[1..]));

    /// <summary>System.Text.Json's "$.samples[0].collectedAt" → "samples[0].collectedAt".</summary>
    public static string FromJsonPath(string? path) =>
        string.IsNullOrEmpty(path) || path == "$" ? "body" : path.TrimStart('$').TrimStart('.');
}
