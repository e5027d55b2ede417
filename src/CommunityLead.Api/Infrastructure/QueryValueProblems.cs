using System.Globalization;
using Microsoft.AspNetCore.Diagnostics;
using Microsoft.AspNetCore.Http.Metadata;

namespace CommunityLead.Api.Infrastructure;

/// <summary>
/// The compiled endpoints (ASP.NET Core's request delegate generator) answer an optional query value that does not
/// convert (`?page=two`) with a bare 400 instead of throwing as a required one does, so nothing would say which
/// value was wrong. Before the status-code page is written, this finds it from the endpoint's own parameter list and
/// words it as <see cref="BadRequestExceptionHandler"/> words a thrown one.
/// </summary>
public static class QueryValueProblems
{
    public static async Task HandleAsync(StatusCodeContext context)
    {
        var http = context.HttpContext;
        if (http.Response.StatusCode == StatusCodes.Status400BadRequest && FirstUnconvertible(http) is var (name, value))
        {
            var problems = http.RequestServices.GetRequiredService<IProblemDetailsService>();
            if (await problems.TryWriteAsync(new ProblemDetailsContext
                {
                    HttpContext = http, ProblemDetails = BadRequestExceptionHandler.WrongValue(name, value),
                })) return;
        }
        await Default(context);
    }

    // The framework's own status-code page: problem details with the status and its title.
    private static readonly Func<StatusCodeContext, Task> Default = new StatusCodePagesOptions().HandleAsync;

    private static (string Name, string Value)? FirstUnconvertible(HttpContext http)
    {
        foreach (var parameter in http.GetEndpoint()?.Metadata.GetOrderedMetadata<IParameterBindingMetadata>() ?? [])
        {
            if (!parameter.HasTryParse || !http.Request.Query.TryGetValue(parameter.Name, out var values)) continue;
            var type = Nullable.GetUnderlyingType(parameter.ParameterInfo.ParameterType) ?? parameter.ParameterInfo.ParameterType;
            foreach (var value in values)
                if (!string.IsNullOrEmpty(value) && Converts(type, value) == false) return (parameter.Name, value);
        }
        return null;
    }

    // The types the endpoints take as optional query values; any other is left to the framework's page (null: not
    // known here).
    private static bool? Converts(Type type, string value) => type switch
    {
        _ when type == typeof(int) => int.TryParse(value, NumberStyles.Integer, CultureInfo.InvariantCulture, out _),
        _ when type == typeof(long) => long.TryParse(value, NumberStyles.Integer, CultureInfo.InvariantCulture, out _),
        _ when type == typeof(bool) => bool.TryParse(value, out _),
        _ when type == typeof(Guid) => Guid.TryParse(value, out _),
        _ => null,
    };
}
