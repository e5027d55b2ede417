using System.Text;
using System.Text.Json;

namespace CommunityLead.Tests.Deploy;

/// <summary>
/// The few Dockerfile instructions the tests need, read as Docker reads them: a trailing backslash
/// continues the line, comment and blank lines (even inside a continuation) are dropped, and each FROM starts a stage.
/// </summary>
internal sealed class Dockerfile(IReadOnlyList<IReadOnlyList<(string Keyword, string Arguments)>> stages)
{
    public IReadOnlyList<IReadOnlyList<(string Keyword, string Arguments)>> Stages => stages;

    /// <summary>The last stage is the image that runs.</summary>
    public IReadOnlyList<(string Keyword, string Arguments)> Runtime => stages[^1];

    public static Dockerfile Load(string path)
    {
        var stages = new List<List<(string, string)>>();
        var logical = new StringBuilder();
        foreach (var raw in File.ReadLines(path))
        {
            var line = raw.Trim();
            // Docker drops blank lines even inside a continuation, so they never end an instruction.
            if (line.StartsWith('#') || line.Length == 0) continue;
            if (line.EndsWith('\\')) { logical.Append(line[..^1]).Append(' '); continue; }
            logical.Append(line);
            var text = logical.ToString().Trim();
            logical.Clear();
            if (text.Length == 0) continue;
            var space = text.IndexOfAny([' ', '\t']);
            var keyword = (space < 0 ? text : text[..space]).ToUpperInvariant();
            if (keyword == "FROM") stages.Add([]);
            stages[^1].Add((keyword, space < 0 ? "" : text[(space + 1)..].Trim()));
        }
        return new Dockerfile(stages);
    }

    public IEnumerable<string> All(string keyword) =>
        Runtime.Where(i => i.Keyword == keyword).Select(i => i.Arguments);

    public string? Last(string keyword) => All(keyword).LastOrDefault();

    /// <summary>Exec form only: a shell-form ENTRYPOINT would not receive `docker run` arguments.</summary>
    public string[] Entrypoint => JsonSerializer.Deserialize<string[]>(Last("ENTRYPOINT")!)!;

    public IReadOnlyList<string> VolumePaths => Last("VOLUME") is { } v
        ? (v.StartsWith('[') ? JsonSerializer.Deserialize<string[]>(v)! : v.Split(' ', StringSplitOptions.RemoveEmptyEntries))
        : [];

    /// <summary>Every ENV of the runtime stage, later ones winning, as the container's environment gets them.</summary>
    public IReadOnlyDictionary<string, string> Env
    {
        get
        {
            var env = new Dictionary<string, string>();
            foreach (var arguments in All("ENV"))
                foreach (var (name, value) in DockerWords.EnvPairs(arguments)) env[name] = value;
            return env;
        }
    }

    /// <summary>The shell-form command after HEALTHCHECK's --options and CMD (Docker runs it with /bin/sh -c).</summary>
    public string? HealthcheckCommand
    {
        get
        {
            var rest = Last("HEALTHCHECK");
            while (rest is not null && rest.StartsWith("--")) rest = rest[(rest.IndexOf(' ') + 1)..].TrimStart();
            return rest is not null && rest.StartsWith("CMD ") ? rest[4..].Trim() : null;
        }
    }
}
