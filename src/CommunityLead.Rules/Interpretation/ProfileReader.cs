using System.Text;
using System.Text.Json;
using System.Text.RegularExpressions;

namespace CommunityLead.Rules.Interpretation;

/// <summary>
/// Reads and validates rule profile files (seed-data/profiles/*.json); a broken file names itself and the field,
/// so a bad profile stops the service at start-up with a message a person can act on.
/// </summary>
public static partial class ProfileReader
{
    /// <summary>Every interpretation and letter stores the id it was made with, in a column of this many characters.</summary>
    public const int IdMaxLength = 60;

    private static readonly IReadOnlyList<string> Fields = ["id", "version", "name", "nameEs", "jurisdiction", "notes", "levels"];

    public static RuleProfile Read(string fileName, string json)
    {
        using var document = Parse(fileName, json);
        var profile = new ProfileObject(fileName, "", document.RootElement, Fields);
        var id = profile.Text("id");
        if (!IdPattern().IsMatch(id))
            throw profile.Problem("id", $"\"{id}\" may hold only lower-case letters, digits and hyphens");
        if (id.Length > IdMaxLength)
            throw profile.Problem("id", $"\"{id}\" is {id.Length} characters long; an id has at most {IdMaxLength}");
        var version = profile.WholeNumber("version");
        if (version < 1) throw profile.Problem("version", $"must be 1 or more, not {version}");
        var name = profile.Text("name");
        var spanishName = profile.OptionalText("nameEs");
        var jurisdiction = profile.Text("jurisdiction");
        var notes = profile.OptionalText("notes");

        var entries = profile.Array("levels");
        if (entries.Count == 0) throw profile.Problem("levels", "is empty; a profile needs at least one level");
        var levels = entries.Select((entry, index) => ProfileLevelReader.Read(fileName, index, entry)).ToList();
        ProfileChecks.NoOverlaps(fileName, levels);
        ProfileChecks.LeadActionLevelAlways(fileName, levels);
        return new RuleProfile(id, version, name, jurisdiction, levels, notes, spanishName);
    }

    /// <summary>Reads every file; two files claiming the same id would make "profile X version N" ambiguous.</summary>
    public static IReadOnlyList<RuleProfile> ReadAll(IEnumerable<(string FileName, string Json)> files)
    {
        var fileById = new Dictionary<string, string>(StringComparer.Ordinal);
        var profiles = new List<RuleProfile>();
        foreach (var (fileName, json) in files)
        {
            var profile = Read(fileName, json);
            if (!fileById.TryAdd(profile.Id, fileName))
                throw new ProfileException(fileName, "id",
                    $"\"{profile.Id}\" is also the id of {fileById[profile.Id]}; each profile needs its own id");
            profiles.Add(profile);
        }
        return profiles;
    }

    private static JsonDocument Parse(string fileName, string json)
    {
        // File.ReadAllText drops a byte order mark, but text from elsewhere may still carry one.
        var text = json.TrimStart('\uFEFF');
        try
        {
            return JsonDocument.Parse(text);
        }
        catch (JsonException e)
        {
            var reason = e.Message.Split(" LineNumber:")[0];
            throw new ProfileException(fileName, "$", $"is not valid JSON at {Where(text, e)}: {reason}");
        }
    }

    // The reader counts bytes of UTF-8 from 0; people count characters from 1 (µ is two bytes, one character).
    private static string Where(string text, JsonException e)
    {
        var lineIndex = (int)(e.LineNumber ?? 0);
        var lines = text.Split('\n');
        var line = lineIndex < lines.Length ? Encoding.UTF8.GetBytes(lines[lineIndex]) : [];
        var bytes = (int)Math.Min(e.BytePositionInLine ?? 0, line.Length);
        return $"line {lineIndex + 1}, column {Encoding.UTF8.GetCharCount(line, 0, bytes) + 1}";
    }

    // \z rather than $, which would also accept a trailing newline.
    [GeneratedRegex(@"^[a-z0-9-]+\z")]
    private static partial Regex IdPattern();
}
