using System.Globalization;
using System.Text.Json;
using System.Text.Json.Serialization;

namespace CommunityLead.Api.Infrastructure;

/// <summary>
/// Times must say their UTC offset. Without one, "06:00" could be the household's 06:00 or the server's,
/// and a standing time could be off by hours; so a time without an offset is refused, not guessed.
/// </summary>
public sealed class OffsetRequiredConverter : JsonConverter<DateTimeOffset>
{
    public const string Message = "Times need a date, a time and a UTC offset, like 2026-04-03T06:00:00-05:00.";

    public override DateTimeOffset Read(ref Utf8JsonReader reader, Type typeToConvert, JsonSerializerOptions options)
    {
        var text = reader.TokenType == JsonTokenType.String ? reader.GetString() : null;
        return text is not null && TryParse(text, out var value) ? value : throw new JsonException(Message);
    }

    /// <summary>The same rule for text from elsewhere (CSV cells, query strings).</summary>
    public static bool TryParse(string text, out DateTimeOffset value)
    {
        value = default;
        return HasOffset(text) && DateTimeOffset.TryParse(text, CultureInfo.InvariantCulture, DateTimeStyles.None, out value);
    }

    public override void Write(Utf8JsonWriter writer, DateTimeOffset value, JsonSerializerOptions options) =>
        writer.WriteStringValue(value.ToString("yyyy-MM-dd'T'HH:mm:ssK", CultureInfo.InvariantCulture));

    private static bool HasOffset(string text)
    {
        var t = text.IndexOf('T');
        if (t < 0) return false;
        var time = text[t..];
        return time.EndsWith('Z') || time.EndsWith('z') || time.Contains('+') || time.Contains('-');
    }
}

public sealed class NullableOffsetRequiredConverter : JsonConverter<DateTimeOffset?>
{
    private readonly OffsetRequiredConverter inner = new();

    public override DateTimeOffset? Read(ref Utf8JsonReader reader, Type typeToConvert, JsonSerializerOptions options) =>
        reader.TokenType == JsonTokenType.Null ? null : inner.Read(ref reader, typeof(DateTimeOffset), options);

    public override void Write(Utf8JsonWriter writer, DateTimeOffset? value, JsonSerializerOptions options)
    {
        if (value is null) writer.WriteNullValue();
        else inner.Write(writer, value.Value, options);
    }
}
