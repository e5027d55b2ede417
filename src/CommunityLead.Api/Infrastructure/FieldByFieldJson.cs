using System.Collections;
using System.Reflection;
using System.Text.Json;
using System.Text.Json.Nodes;
using System.Text.Json.Serialization;

namespace CommunityLead.Api.Infrastructure;

/// <summary>
/// A request read one field at a time, so a form with several fields of the wrong type or value (a language "fr",
/// a date without its offset, a water source "tap") is answered with one 400 naming every one, not the first
/// alone. The fields that did not read are left out of the request (null) and named in <see cref="ReadProblems"/>;
/// <see cref="ValidationFilter"/> reports them with the validator's findings on the rest.
/// </summary>
public interface IReadFieldByField
{
    IReadOnlyDictionary<string, string[]>? ReadProblems { get; set; }
}

/// <summary>Registered once (JsonSetup); converts every <see cref="IReadFieldByField"/> request.</summary>
public sealed class FieldByFieldConverterFactory : JsonConverterFactory
{
    public override bool CanConvert(Type typeToConvert) => typeof(IReadFieldByField).IsAssignableFrom(typeToConvert);

    public override JsonConverter CreateConverter(Type typeToConvert, JsonSerializerOptions options)
    {
        // The same options without this factory read each field, and then the cleaned object, the ordinary way.
        var plain = new JsonSerializerOptions(options);
        foreach (var own in plain.Converters.OfType<FieldByFieldConverterFactory>().ToList()) plain.Converters.Remove(own);
        return (JsonConverter)Activator.CreateInstance(typeof(FieldByFieldConverter<>).MakeGenericType(typeToConvert), plain)!;
    }
}

public sealed class FieldByFieldConverter<T>(JsonSerializerOptions plain) : JsonConverter<T> where T : class, IReadFieldByField
{
    public override T? Read(ref Utf8JsonReader reader, Type typeToConvert, JsonSerializerOptions options)
    {
        JsonNode? node;
        // Broken JSON never gets here: the serializer reads a converter's whole value ahead, and says it is malformed.
        try
        {
            node = JsonNode.Parse(ref reader, new JsonNodeOptions { PropertyNameCaseInsensitive = plain.PropertyNameCaseInsensitive });
        }
        catch (ArgumentException)
        {
            throw new JsonException("A field appears twice in the request.");
        }
        if (node is not JsonObject body) return node.Deserialize<T>(plain);
        var problems = new Dictionary<string, string[]>();
        Clean(body, typeof(T), "", problems);
        var request = body.Deserialize<T>(plain)!;
        if (problems.Count > 0) request.ReadProblems = problems;
        return request;
    }

    public override void Write(Utf8JsonWriter writer, T value, JsonSerializerOptions options) =>
        JsonSerializer.Serialize(writer, value, plain);

    /// <summary>Removes every field that does not read as its type, recording why; nested objects field by field too.</summary>
    private void Clean(JsonObject body, Type type, string prefix, Dictionary<string, string[]> problems)
    {
        foreach (var (name, value) in body.ToList())
        {
            var property = type.GetProperty(name, BindingFlags.Public | BindingFlags.Instance | BindingFlags.IgnoreCase);
            var field = prefix + JsonNamingPolicy.CamelCase.ConvertName(property?.Name ?? name);
            if (property is null || property.IsDefined(typeof(JsonIgnoreAttribute)))
            {
                problems[field] = ["This field is not part of the request."];
                body.Remove(name);
                continue;
            }
            var fieldType = Nullable.GetUnderlyingType(property.PropertyType) ?? property.PropertyType;
            if (value is JsonObject nested && IsObject(fieldType))
            {
                Clean(nested, fieldType, field + ".", problems);
                continue;
            }
            try
            {
                value.Deserialize(property.PropertyType, plain);
            }
            catch (JsonException e)
            {
                problems[field] = [BadRequestExceptionHandler.Explain(e, fieldType)];
                body.Remove(name);
            }
        }
    }

    private static bool IsObject(Type type) =>
        type.IsClass && type != typeof(string) && !typeof(IEnumerable).IsAssignableFrom(type);
}
