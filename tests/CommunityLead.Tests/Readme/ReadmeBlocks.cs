using System.Text.RegularExpressions;

namespace CommunityLead.Tests.Readme;

/// <summary>One fenced shell block of the README and the line its fence opens on.</summary>
internal sealed record ReadmeBlock(int Line, string Text)
{
    /// <summary>The command that starts the service in the foreground, as "Run it" gives it.</summary>
    public const string ServiceCommand = "dotnet run --project src/CommunityLead.Api";

    public bool StartsTheService => Text.Trim() == ServiceCommand;

    /// <summary>
    /// Blocks that run the test suite itself (or a part of it) are not walked: a test can't run its own suite. Nor
    /// is the performance table (ten minutes of load on purpose); it fails loudly on its own when a step breaks.
    /// </summary>
    public bool RunsTheSuite => Text.Contains("dotnet test", StringComparison.Ordinal) || Text.Contains(".ci/postgres", StringComparison.Ordinal)
                                || Text.Contains("tests/CommunityLead.Benchmarks", StringComparison.Ordinal);

    public static IReadOnlyList<ReadmeBlock> Read(string markdown)
    {
        var blocks = new List<ReadmeBlock>();
        var lines = markdown.Split('\n');
        for (var i = 0; i < lines.Length; i++)
        {
            if (!Regex.IsMatch(lines[i], @"^```(sh|bash|shell)\s*$")) continue;
            var start = i;
            var body = new List<string>();
            for (i++; i < lines.Length && !lines[i].StartsWith("```", StringComparison.Ordinal); i++) body.Add(lines[i]);
            blocks.Add(new ReadmeBlock(start + 1, string.Join('\n', body)));
        }
        return blocks;
    }
}
