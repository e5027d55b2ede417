using System.Text.Json;
using System.Text.Json.Serialization;

namespace CommunityLead.Api.Infrastructure;

public static class JsonSetup
{
    /// <summary>The contract's JSON: camelCase names, kebab-case enum strings, offsets required on times.</summary>
    public static void Configure(JsonSerializerOptions options)
    {
        options.PropertyNamingPolicy = JsonNamingPolicy.CamelCase;
        options.Converters.Add(new JsonStringEnumConverter(JsonNamingPolicy.KebabCaseLower, allowIntegerValues: false));
        options.Converters.Add(new OffsetRequiredConverter());
        options.Converters.Add(new NullableOffsetRequiredConverter());
        options.Converters.Add(new NoNulText());
        options.Converters.Add(new FiniteNumbers());
        options.Converters.Add(new FieldByFieldConverterFactory());
        // A misspelt field ("collectedAT") would otherwise be dropped silently and surface later as a
        // confusing flag; naming it in a 400 is kinder.
        options.UnmappedMemberHandling = JsonUnmappedMemberHandling.Disallow;
    }
}
