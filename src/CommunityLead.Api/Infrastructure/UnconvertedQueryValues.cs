using System.Globalization;
using System.Reflection;
using Microsoft.AspNetCore.Http.Metadata;

namespace CommunityLead.Api.Infrastructure;

/// <summary>
/// The endpoints are compiled with the service (ASP.NET Core's request delegate generator, for start-up: README,
/// Speed). Its code answers an optional query value that does not convert ("?pageSize=ten", "?combined=maybe") with a
/// bare 400 and nothing written, where a required one, or a delegate built at run time, throws the
/// <see cref="BadHttpRequestException"/> that <see cref="BadRequestExceptionHandler"/> turns into a problem naming it.
/// This middleware sees such a bare 400 on its way back, finds the query value the endpoint's parameters could not
/// take, and throws that same exception, so the answer names the value whichever code bound it.
/// </summary>
public static class UnconvertedQueryValues
{
    public static async Task NameThemAsync(HttpContext context, RequestDelegate next)
    {
        await next(context);
        if (context.Response.StatusCode != StatusCodes.Status400BadRequest || context.Response.HasStarted) return;
        var parameters = context.GetEndpoint()?.Metadata.GetOrderedMetadata<IParameterBindingMetadata>() ?? [];
        foreach (var parameter in parameters)
        {
            if (!parameter.HasTryParse || !context.Request.Query.TryGetValue(parameter.Name, out var values)) continue;
            var type = parameter.ParameterInfo.ParameterType;
            var value = values.ToString();
            if (value.Length == 0 || Converts(Nullable.GetUnderlyingType(type) ?? type, value)) continue;
            // The runtime-built delegate's own words, which the exception handler reads the name and value from.
            throw new BadHttpRequestException($"Failed to bind parameter \"{type.Name} {parameter.Name}\" from \"{value}\".");
        }
    }

    /// <summary>Whether the type's own TryParse takes the value, as the generated code calls it (invariant culture).</summary>
    internal static bool Converts(Type type, string value)
    {
        if (type.IsEnum) return Enum.TryParse(type, value, out _);
        var withCulture = type.GetMethod("TryParse", BindingFlags.Public | BindingFlags.Static,
            [typeof(string), typeof(IFormatProvider), type.MakeByRefType()]);
        if (withCulture is not null) return (bool)withCulture.Invoke(null, [value, CultureInfo.InvariantCulture, null])!;
        var plain = type.GetMethod("TryParse", BindingFlags.Public | BindingFlags.Static, [typeof(string), type.MakeByRefType()]);
        // A type this cannot try is taken as converting: the answer then stays the bare 400 it was.
        return plain is null || (bool)plain.Invoke(null, [value, null])!;
    }
}
