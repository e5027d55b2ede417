using System.Diagnostics;
using CommunityLead.Api.Commands;
using CommunityLead.Tests.Deploy;
using CommunityLead.Tests.Infrastructure;

namespace CommunityLead.Tests.Commands;

/// <summary>How the arguments are read: what runs the service, what is a command, and what is a mistake.</summary>
public class CommandLineTests
{
    [Theory]
    [InlineData]
    [InlineData("serve")]
    [InlineData("--urls", "http://127.0.0.1:5020")]                // deploy/communitylead.service
    [InlineData("serve", "--urls=http://127.0.0.1:5020")]
    [InlineData("--Sampling:MinimumStanding", "06:00:00")]
    [InlineData("Database:MigrateOnStartup=false")]
    public void CommandLine_NoCommandOrServeWithHostSettings_RunsTheService(params string[] args)
    {
        var parsed = CommandLine.Parse(args);
        Assert.Empty(parsed.Problems);
        Assert.True(parsed.RunsService);
        Assert.False(parsed.NeedsServices);
    }

    [Theory]
    [InlineData("migrate")]
    [InlineData("demo")]
    [InlineData("keys", "list")]
    [InlineData("keys", "create", "--role", "lab", "--label", "partner-lab")]
    [InlineData("keys", "revoke", "partner-lab")]
    [InlineData("backup", "/var/backups/x.db", "--ConnectionStrings:CommunityLead=Data Source=y.db")]
    public void CommandLine_Commands_NeedTheServicesAndDoNotRunTheService(params string[] args)
    {
        var parsed = CommandLine.Parse(args);
        Assert.Empty(parsed.Problems);
        Assert.True(parsed.NeedsServices);
        Assert.False(parsed.RunsService);
    }

    [Theory]
    [InlineData("kyes", "list")]
    [InlineData("serve", "now")]
    [InlineData("migrate", "--force")]
    [InlineData("keys", "lsit")]
    [InlineData("keys", "create", "--role", "lab")]
    [InlineData("keys", "create", "--role", "janitor", "--label", "x")]
    [InlineData("backup")]
    [InlineData("backup", "a.db", "b.db")]
    [InlineData("-x")]
    public async Task CommandLine_Mistakes_UsageErrorWithHelpOnStandardErrorAndNoServices(params string[] args)
    {
        var parsed = CommandLine.Parse(args);
        Assert.NotEmpty(parsed.Problems);
        Assert.False(parsed.RunsService);
        Assert.False(parsed.NeedsServices);
        using var output = new StringWriter();
        using var error = new StringWriter();

        Assert.Equal(CommandLine.UsageError, await parsed.RunAsync(null, output, error));

        Assert.Empty(output.ToString());
        Assert.Contains("Usage:", error.ToString());
    }

    [Theory]
    [InlineData("help")]
    [InlineData("--help")]
    [InlineData("-h")]
    public async Task CommandLine_Help_ListsEveryCommandAndExitsZero(string word)
    {
        using var output = new StringWriter();
        Assert.Equal(0, await CommandLine.Parse([word]).RunAsync(null, output, TextWriter.Null));
        foreach (var command in new[] { "serve", "migrate", "keys", "demo", "backup" }) Assert.Contains(command, output.ToString());
    }

    [Theory]
    [InlineData("keys", "create", "--help")]
    [InlineData("--version")]
    public async Task CommandLine_HelpOrVersionOption_AnswersWithoutServicesAndNeverStartsTheService(params string[] args)
    {
        var parsed = CommandLine.Parse(args);
        Assert.True(parsed.IsHelp);
        Assert.False(parsed.RunsService);
        Assert.False(parsed.NeedsServices);
        using var output = new StringWriter();
        Assert.Equal(0, await parsed.RunAsync(null, output, TextWriter.Null));
        Assert.NotEmpty(output.ToString().Trim());
    }

    [Fact]
    public async Task Program_UnknownCommand_ExitsTwoWithHelpAndCreatesNoDatabase()
    {
        // Before, "kyes list" was ignored as a word, so the web server started and created the database.
        var folder = Directory.CreateTempSubdirectory("cl-typo").FullName;
        try
        {
            var database = Path.Combine(folder, "x.db");
            var start = new ProcessStartInfo("dotnet", [typeof(Program).Assembly.Location, "kyes", "list"])
            {
                WorkingDirectory = ImageRun.ProgramFolder,
                Environment = { ["ConnectionStrings__CommunityLead"] = $"Data Source={database}" },
            };
            using var program = new StartedProgram(start);

            Assert.Equal(CommandLine.UsageError, await program.ExitCodeAsync(ImageRun.Patience));
            Assert.Contains("'kyes'", program.Error);
            Assert.Contains("keys", program.Error); // the help names the command meant
            Assert.Empty(program.Output.Trim());
            Assert.Empty(Directory.GetFileSystemEntries(folder));
        }
        finally
        {
            Directory.Delete(folder, recursive: true);
        }
    }

    [Fact]
    public async Task Backup_IntoAMissingFolder_ExitsOneNamingTheFolder()
    {
        using var app = new CommunityLeadFactory();
        var missing = Path.Combine(Path.GetTempPath(), $"cl-missing-{Guid.NewGuid():N}");
        using var output = new StringWriter();
        using var error = new StringWriter();

        var exit = await CommandLine.RunAsync(["backup", Path.Combine(missing, "x.db")], app.Services, output, error);

        Assert.Equal(CommandLine.Failed, exit);
        Assert.Contains($"The folder {missing} does not exist", error.ToString());
        Assert.Empty(output.ToString());
        Assert.False(Directory.Exists(missing));
    }
}
