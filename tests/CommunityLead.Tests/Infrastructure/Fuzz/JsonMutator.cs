using System.Text.Encodings.Web;
using System.Text.Json;
using System.Text.Json.Nodes;

namespace CommunityLead.Tests.Infrastructure.Fuzz;

/// <summary>
/// Changes a valid JSON body a little, the way a buggy client or a careless tester would: one field replaced by a
/// nasty value, removed, retyped or joined by an unknown one, a null or a copy in a list, the text cut short.
/// Numbers no double can hold (1e309) cannot live in a JsonNode, so they travel as placeholders spliced into the text.
/// </summary>
public sealed class JsonMutator(Random random)
{
    private const string RawMark = "~raw~";

    private static readonly JsonSerializerOptions Writing = new() { Encoder = JavaScriptEncoder.UnsafeRelaxedJsonEscaping };

    /// <summary>Number tokens JSON allows and a double cannot hold, or only just.</summary>
    private static readonly string[] RawNumbers =
        ["1e309", "-1e309", "1e-400", "123456789012345678901234567890", "1.7976931348623157e308", "-0", "4.9e-324", "2147483648", "1E+400"];

    /// <summary>Text a JSON field might get: empty, huge, invisible, out of range, the wrong shape.</summary>
    public static readonly string[] NastyText =
    [
        "", " ", "\u0000", "\uFEFFname", "null", "NaN", "Infinity", "-1", "0", "12,4", "1e309", "true",
        "9999-12-31T23:59:59+14:00", "0001-01-01T00:00:00-14:00", "2026-02-30T06:00:00+00:00", "2026-04-03T06:00:00",
        "2026-04-03", "2026-04-03T06:00:00+25:00", "24:00", "first-draw", "FIRST_DRAW", "Pb", "ppm", "<", "J",
        "ZZZZ-ZZZZ-Z", "7KQ4-M2XD-H", "'; DROP TABLE kits; --", "=HYPERLINK(\"x\")", "\u202Eevil", "😀", "a\r\nb", "%00",
        new string('x', 5_000), new string('é', 300),
    ];

    public JsonNode Mutate(JsonNode body)
    {
        var copy = body.DeepClone();
        var steps = random.Next(1, 4);
        for (var i = 0; i < steps; i++) copy = MutateOnce(copy);
        return copy;
    }

    /// <summary>The JSON text, with placeholders made raw number tokens and, now and then, the text cut short.</summary>
    public string Text(JsonNode body)
    {
        var text = body.ToJsonString(Writing);
        while (text.IndexOf($"\"{RawMark}", StringComparison.Ordinal) is var at and >= 0)
        {
            var end = text.IndexOf('"', at + 1);
            text = text[..at] + text[(at + 1 + RawMark.Length)..end] + text[(end + 1)..];
        }
        return random.Next(40) == 0 ? text[..random.Next(text.Length)] : text;
    }

    public JsonNode? NastyValue() => random.Next(12) switch
    {
        0 => null,
        1 => JsonValue.Create(random.Next(2) == 0),
        2 => JsonValue.Create(RawMark + RawNumbers[random.Next(RawNumbers.Length)]),
        3 => JsonValue.Create(new[] { 0, -1, 1, int.MaxValue, int.MinValue, 30, 31, 5001 }[random.Next(8)]),
        4 => JsonValue.Create(new[] { 1e308, -1e308, 1e-300, -1e-300, 0.1, 1e15, double.Epsilon }[random.Next(7)]),
        5 => new JsonObject(),
        6 => new JsonArray(),
        7 => new JsonArray(null, JsonValue.Create(1)),
        _ => JsonValue.Create(NastyText[random.Next(NastyText.Length)]),
    };

    private JsonNode MutateOnce(JsonNode root)
    {
        var (parent, key, index) = PickSlot(root);
        switch (random.Next(7))
        {
            case 0 when parent is JsonObject o && key is not null:
                o.Remove(key);
                break;
            case 1 when parent is JsonObject o:
                o[$"extra{random.Next(3)}"] = NastyValue();
                break;
            case 2 when parent is JsonArray a:
                a.Insert(random.Next(a.Count + 1), random.Next(2) == 0 ? null : a.Count > 0 ? a[random.Next(a.Count)]?.DeepClone() : null);
                break;
            case 3 when parent is not null && Get(parent, key, index) is JsonValue v:
                // The same value in the other JSON type: 12.4 → "12.4", "1000" → 1000.
                Set(parent, key, index, v.TryGetValue<string>(out var s)
                    ? double.TryParse(s, System.Globalization.CultureInfo.InvariantCulture, out var d) && double.IsFinite(d) ? JsonValue.Create(d) : JsonValue.Create(s.Length)
                    : JsonValue.Create(v.ToJsonString()));
                break;
            default:
                if (parent is null) return NastyValue() ?? JsonValue.Create(0)!;
                Set(parent, key, index, NastyValue());
                break;
        }
        return root;
    }

    /// <summary>A random place in the tree: a field of an object or an element of an array (null parent: the root).</summary>
    private (JsonNode? Parent, string? Key, int Index) PickSlot(JsonNode root)
    {
        var slots = new List<(JsonNode?, string?, int)> { (null, null, -1) };
        void Walk(JsonNode? node)
        {
            if (node is JsonObject o)
                foreach (var (k, v) in o.ToList()) { slots.Add((o, k, -1)); Walk(v); }
            else if (node is JsonArray a)
                for (var i = 0; i < a.Count; i++) { slots.Add((a, null, i)); Walk(a[i]); }
        }
        Walk(root);
        if (slots.Count == 1) return slots[0];
        // The root itself only rarely: a body that is one number says little more each time.
        return slots[random.Next(50) == 0 ? 0 : random.Next(1, slots.Count)];
    }

    private static JsonNode? Get(JsonNode? parent, string? key, int index) =>
        parent switch { JsonObject o when key is not null => o[key], JsonArray a when index >= 0 => a[index], _ => null };

    private static void Set(JsonNode parent, string? key, int index, JsonNode? value)
    {
        if (parent is JsonObject o && key is not null) o[key] = value;
        else if (parent is JsonArray a && index >= 0) a[index] = value;
    }
}
