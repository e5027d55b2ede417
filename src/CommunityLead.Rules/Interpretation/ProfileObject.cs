using System.Globalization;
using System.Text.Json;

namespace CommunityLead.Rules.Interpretation;

/// <summary>
/// One JSON object of a profile file, read field by field so every problem names its path. Unknown and repeated
/// fields are refused: a misspelt "efectiveFrom" would otherwise be dropped and the level apply on every date.
/// </summary>
internal sealed class ProfileObject
{
    private readonly string fileName;
    private readonly string path;
    private readonly Dictionary<string, JsonElement> fields = new(StringComparer.Ordinal);

    public ProfileObject(string fileName, string path, JsonElement element, IReadOnlyList<string> known)
    {
        this.fileName = fileName;
        this.path = path;
        if (element.ValueKind != JsonValueKind.Object)
            throw new ProfileException(fileName, path.Length == 0 ? "$" : path, $"must be an object {{ ... }}, not {Describe(element)}");
        foreach (var property in element.EnumerateObject())
        {
            if (!known.Contains(property.Name))
                throw Problem(property.Name, $"is not a field we know; the fields are {string.Join(", ", known)}");
            if (!fields.TryAdd(property.Name, property.Value))
                throw Problem(property.Name, "appears twice");
        }
    }

    public ProfileException Problem(string name, string problem) =>
        new(fileName, path.Length == 0 ? name : $"{path}.{name}", problem);

    public string Text(string name) => OptionalText(name) ?? throw Problem(name, "is missing");

    public string? OptionalText(string name)
    {
        if (Field(name) is not { } value) return null;
        if (value.ValueKind != JsonValueKind.String) throw Problem(name, $"must be text in quotes, not {Describe(value)}");
        var text = value.GetString()!;
        return string.IsNullOrWhiteSpace(text) ? throw Problem(name, "is empty") : text;
    }

    public int WholeNumber(string name) =>
        Required(name).TryGetInt32(out var number) ? number : throw Problem(name, "must be a whole number");

    public double Number(string name) =>
        Required(name).TryGetDouble(out var number) ? number : throw Problem(name, "must be a number");

    public bool Flag(string name) => Field(name) switch
    {
        null => false,
        { ValueKind: JsonValueKind.True } => true,
        { ValueKind: JsonValueKind.False } => false,
        { } value => throw Problem(name, $"must be true or false, not {Describe(value)}"),
    };

    public DateOnly? Date(string name) => OptionalText(name) is not { } text ? null
        : DateOnly.TryParseExact(text, "yyyy-MM-dd", CultureInfo.InvariantCulture, DateTimeStyles.None, out var date) ? date
        : throw Problem(name, $"\"{text}\" is not a date written like 2036-01-12");

    public T Choice<T>(string name) where T : struct, Enum => ProfileNames.Parse<T>(Text(name), this, name);

    /// <summary>An optional list of choices; null when absent. An empty list is refused: leave the field out instead.</summary>
    public IReadOnlyList<T>? Choices<T>(string name) where T : struct, Enum
    {
        var items = OptionalArray(name);
        if (items is null) return null;
        if (items.Count == 0) throw Problem(name, "is an empty list; leave it out to mean every one");
        var choices = new List<T>();
        for (var i = 0; i < items.Count; i++)
        {
            var item = $"{name}[{i}]";
            if (items[i].ValueKind != JsonValueKind.String) throw Problem(item, $"must be text in quotes, not {Describe(items[i])}");
            var choice = ProfileNames.Parse<T>(items[i].GetString()!, this, item);
            if (choices.Contains(choice)) throw Problem(item, $"\"{items[i].GetString()}\" is listed twice");
            choices.Add(choice);
        }
        return choices;
    }

    public IReadOnlyList<JsonElement> Array(string name) => OptionalArray(name) ?? throw Problem(name, "is missing");

    public bool Has(string name) => Field(name) is not null;

    private IReadOnlyList<JsonElement>? OptionalArray(string name) => Field(name) switch
    {
        null => null,
        { ValueKind: JsonValueKind.Array } value => value.EnumerateArray().ToList(),
        { } value => throw Problem(name, $"must be a list [ ... ], not {Describe(value)}"),
    };

    private JsonElement Required(string name)
    {
        var value = Field(name) ?? throw Problem(name, "is missing");
        return value.ValueKind == JsonValueKind.Number ? value : throw Problem(name, $"must be a number, not {Describe(value)}");
    }

    // JSON null counts as absent, so "notes": null reads like no notes and "id": null like a missing id.
    private JsonElement? Field(string name) =>
        fields.TryGetValue(name, out var value) && value.ValueKind != JsonValueKind.Null ? value : null;

    private static string Describe(JsonElement value) => value.ValueKind switch
    {
        JsonValueKind.String => "text",
        JsonValueKind.Number => "a number",
        JsonValueKind.True or JsonValueKind.False => "true/false",
        JsonValueKind.Array => "a list",
        JsonValueKind.Object => "an object",
        _ => "null",
    };
}
