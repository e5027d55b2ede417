using System.Text.Json;
using System.Text.Json.Serialization;
using Microsoft.AspNetCore.Http.HttpResults;

namespace CommunityLead.Api.Infrastructure;

/// <summary>
/// PostgreSQL refuses the NUL character in text (SQLite keeps it), so "\u0000" in any field would otherwise
/// pass every check and fail only when saved. It is refused where text enters: JSON strings, query values and
/// (in the CSV reader) cells. Invisible format characters are dropped from JSON strings here too.
/// </summary>
public sealed class NoNulText : JsonConverter<string>
{
    public const string Message = "Text cannot contain the NUL character (\\u0000); remove it.";

    public static bool Contains(string? text) => text?.Contains('\0') == true;

    public override string? Read(ref Utf8JsonReader reader, Type typeToConvert, JsonSerializerOptions options)
    {
        // No message: System.Text.Json then says "could not be converted", which the handler words as "use text".
        if (reader.TokenType != JsonTokenType.String) throw new JsonException();
        var text = reader.GetString();
        return Contains(text) ? throw new JsonException(Message) : WithoutFormatCharacters(text);
    }

    /// <summary>
    /// Drops invisible format characters (Unicode category Cf: a byte order mark U+FEFF pasted from a file,
    /// zero-width spaces and joiners, direction marks). Unseen, they make two equal names differ, so a search
    /// misses the home, and they travel into letters. No text the program takes needs them.
    /// </summary>
    public static string? WithoutFormatCharacters(string? text)
    {
        if (text is null || !text.Any(IsFormat)) return text;
        return string.Concat(text.Where(c => !IsFormat(c)));
    }

    private static bool IsFormat(char c) => char.GetUnicodeCategory(c) == System.Globalization.UnicodeCategory.Format;

    public override void Write(Utf8JsonWriter writer, string value, JsonSerializerOptions options) => writer.WriteStringValue(value);

    /// <summary>Middleware: a query value with NUL is a 400 naming the parameter, before any endpoint runs.</summary>
    public static async Task InQueryAsync(HttpContext context, RequestDelegate next)
    {
        var bad = context.Request.Query.FirstOrDefault(q => q.Value.Any(Contains));
        if (bad.Key is null)
        {
            await next(context);
            return;
        }
        ValidationProblem problem = Problems.Field(bad.Key, Message);
        await problem.ExecuteAsync(context);
    }
}
