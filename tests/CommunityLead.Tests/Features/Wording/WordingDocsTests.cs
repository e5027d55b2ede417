using CommunityLead.Api.Features.Wording;
using CommunityLead.Tests.Deploy;

namespace CommunityLead.Tests.Features.Wording;

/// <summary>The committed copy of the catalogue (docs/message-catalogue.csv) is the one the code exports now.</summary>
public class WordingDocsTests
{
    public const string Regenerate =
        "dotnet run --project src/CommunityLead.Api -- messages export --format csv --out \"$PWD/docs/message-catalogue.csv\"   (from the repository root)";

    [Fact]
    public void Docs_MessageCatalogue_IsTheCurrentExport()
    {
        var path = RepoFiles.PathOf("docs/message-catalogue.csv");
        Assert.True(File.Exists(path), $"docs/message-catalogue.csv is missing. Make it with:\n  {Regenerate}");
        var committed = File.ReadAllText(path).Replace("\r\n", "\n");
        var current = WordingCsv.Write(WordingCatalogue.Export());
        if (committed == current) return;

        var (old, now) = (committed.Split('\n'), current.Split('\n'));
        var first = Enumerable.Range(0, Math.Max(old.Length, now.Length))
            .First(i => i >= old.Length || i >= now.Length || old[i] != now[i]);
        Assert.Fail($"docs/message-catalogue.csv is stale (wording version {WordingCatalogue.Version}); first difference at line {first + 1}:\n" +
            $"  committed: {(first < old.Length ? old[first] : "(end)")}\n  current:   {(first < now.Length ? now[first] : "(end)")}\n" +
            $"Regenerate it with:\n  {Regenerate}");
    }
}
