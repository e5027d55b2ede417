using System.Text.Json;

namespace CommunityLead.Api.Infrastructure;

/// <summary>Enum values as the contract spells them ("letter-sent", "private-well"), for query strings and text.</summary>
public static class KebabEnum
{
    public static string Name<T>(T value) where T : struct, Enum => JsonNamingPolicy.KebabCaseLower.ConvertName(value.ToString());

    public static bool TryParse<T>(string? text, out T value) where T : struct, Enum
    {
        foreach (var candidate in Enum.GetValues<T>())
            if (string.Equals(Name(candidate), text, StringComparison.OrdinalIgnoreCase))
            {
                value = candidate;
                return true;
            }
        value = default;
        return false;
    }

    public static string Allowed<T>() where T : struct, Enum => string.Join(", ", Enum.GetValues<T>().Select(Name));
}
