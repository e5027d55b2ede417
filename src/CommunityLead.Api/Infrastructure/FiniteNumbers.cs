using System.Text.Json;
using System.Text.Json.Serialization;

namespace CommunityLead.Api.Infrastructure;

/// <summary>
/// JSON can spell a number beyond a double's range (1e309), which System.Text.Json reads as infinity. Infinity
/// cannot be written back as JSON, stored meaningfully or compared with a level, so it is refused where it
/// enters, naming its field, for every request alike. (CSV cells are checked the same way in the lab's reader.)
/// </summary>
public sealed class FiniteNumbers : JsonConverter<double>
{
    public const string Message = "This number is beyond what can be stored (about ±1.8e308); check the figure.";

    public override double Read(ref Utf8JsonReader reader, Type typeToConvert, JsonSerializerOptions options)
    {
        // No message: System.Text.Json then says "could not be converted", which the handler words as "use a number".
        if (reader.TokenType != JsonTokenType.Number || !reader.TryGetDouble(out var value)) throw new JsonException();
        return double.IsFinite(value) ? value : throw new JsonException(Message);
    }

    public override void Write(Utf8JsonWriter writer, double value, JsonSerializerOptions options) => writer.WriteNumberValue(value);
}
