using System.Collections.Frozen;
using System.Text.Json;

namespace CommunityLead.Api.Infrastructure;

/// <summary>Enum values as the contract spells them ("letter-sent", "private-well"), for query strings and text.</summary>
public static class KebabEnum
{
    // Worked out once per value: a report's decision names four enums for each of a million kits.
    private static class Names<T> where T : struct, Enum
    {
        public static readonly FrozenDictionary<T, string> ByValue =
            Enum.GetValues<T>().ToFrozenDictionary(v => v, v => JsonNamingPolicy.KebabCaseLower.ConvertName(v.ToString()));
    }

    public static string Name<T>(T value) where T : struct, Enum =>
        Names<T>.ByValue.TryGetValue(value, out var name) ? name : JsonNamingPolicy.KebabCaseLower.ConvertName(value.ToString());

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
