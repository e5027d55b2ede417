using System.Text.Json.Nodes;
using CommunityLead.Api.Commands;
using CommunityLead.Api.Features.Wording;
using CommunityLead.Tests.Infrastructure;

namespace CommunityLead.Tests.Commands;

public class MessagesCommandTests
{
    private static async Task<(int Exit, string Out, string Err)> RunAsync(CommunityLeadFactory app, params string[] args)
    {
        using var output = new StringWriter();
        using var error = new StringWriter();
        var exit = await CommandLine.RunAsync(args, app.Services, output, error);
        return (exit, output.ToString(), error.ToString());
    }

    [Fact]
    public async Task MessagesExport_CsvToAFile_WritesTheExportAndSaysWhereWithItsVersion()
    {
        using var app = new CommunityLeadFactory();
        var file = Path.Combine(Path.GetTempPath(), "cl-tests", $"catalogue-{Guid.NewGuid():N}.csv");
        Directory.CreateDirectory(Path.GetDirectoryName(file)!);
        try
        {
            var (exit, output, error) = await RunAsync(app, "messages", "export", "--format", "csv", "--out", file);
            Assert.Equal(0, exit);
            Assert.Empty(error);
            Assert.Contains(WordingCatalogue.Version, output);
            Assert.Contains(file, output);
            Assert.Equal(WordingCsv.Write(WordingCatalogue.Export()), await File.ReadAllTextAsync(file));
        }
        finally
        {
            File.Delete(file);
        }
    }

    [Fact]
    public async Task MessagesExport_NoFormat_IsJsonOnStandardOutput()
    {
        using var app = new CommunityLeadFactory();
        var (exit, output, _) = await RunAsync(app, "messages", "export");
        Assert.Equal(0, exit);
        var json = JsonNode.Parse(output)!;
        Assert.Equal(WordingCatalogue.Version, json["version"]!.GetValue<string>());
        Assert.Equal(WordingCatalogue.Export().Count, json["entries"]!.AsArray().Count);
        Assert.Equal("our-wording", json["entries"]!.AsArray().First(e => e!["code"]!.GetValue<string>() == "summary.water.low")!["marker"]!.GetValue<string>());
    }

    [Theory]
    [InlineData("messages")]
    [InlineData("messages", "list")]
    [InlineData("messages", "export", "--format", "xlsx")]
    [InlineData("messages", "export", "--out")]
    [InlineData("messages", "export", "--to", "file.csv")]
    public async Task MessagesExport_BadArguments_ExplainOnStandardErrorWithNonZeroExit(params string[] args)
    {
        using var app = new CommunityLeadFactory();
        var (exit, output, error) = await RunAsync(app, args);
        Assert.Equal(CommandLine.UsageError, exit);
        Assert.NotEmpty(error.Trim());
        Assert.Empty(output.Trim());
    }

    [Fact]
    public async Task MessagesExport_FolderThatDoesNotExist_RefusedSayingWhy()
    {
        using var app = new CommunityLeadFactory();
        var file = Path.Combine(Path.GetTempPath(), "cl-tests", Guid.NewGuid().ToString("N"), "none", "catalogue.csv");
        var (exit, _, error) = await RunAsync(app, "messages", "export", "--out", file);
        Assert.Equal(CommandLine.Failed, exit);
        Assert.Contains("Could not write", error);
        Assert.False(File.Exists(file));
    }
}
