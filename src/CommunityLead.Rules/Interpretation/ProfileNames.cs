using System.Text.Json;

namespace CommunityLead.Rules.Interpretation;

/// <summary>
/// The words profile files use for our enums: kebab-case of the member name ("action-level", "play-area"),
/// so a new member gets its word without a table to keep in step.
/// </summary>
internal static class ProfileNames
{
    public static string Of<T>(T value) where T : struct, Enum =>
        JsonNamingPolicy.KebabCaseLower.ConvertName(value.ToString());

    public static IEnumerable<string> All<T>() where T : struct, Enum => Enum.GetValues<T>().Select(Of);

    internal static T Parse<T>(string text, ProfileObject owner, string name) where T : struct, Enum
    {
        foreach (var value in Enum.GetValues<T>())
            if (Of(value) == text) return value;
        throw owner.Problem(name, $"\"{text}\" is not one we know; use one of {string.Join(", ", All<T>())}");
    }
}
