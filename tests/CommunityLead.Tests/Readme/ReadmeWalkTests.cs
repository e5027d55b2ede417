using System.Diagnostics;
using System.Net.Sockets;
using System.Text;
using CommunityLead.Tests.Deploy;
using Xunit.Abstractions;

namespace CommunityLead.Tests.Readme;

/// <summary>
/// A new user copies the README's shell blocks into a terminal in order: every one must work as written. The
/// walk runs them in one bash (variables carry from block to block, as in one terminal) with errexit and
/// pipefail, so a command that fails, or a curl --fail-with-body that gets anything but 2xx, fails the test.
/// Only two things differ from a person's terminal: the service gets a free port instead of 5020 (the same
/// address is rewritten in every block), and a database file of the walk's own instead of the project's.
/// </summary>
// Pages, the API description and the README are the same whichever store is behind them: the PostgreSQL run
// of .ci/run leaves these out (Store=Independent).
[Trait("Store", "Independent")]
public class ReadmeWalkTests(ITestOutputHelper output)
{
    [Fact]
    public async Task ReadmeShellBlocks_CopiedInOrderOnAFreshDatabase_AllWork()
    {
        if (Environment.GetEnvironmentVariable("COMMUNITYLEAD_TEST_POSTGRES") is not null)
        {
            // The README walks the SQLite service with no setup; the PostgreSQL run of the suite adds nothing here.
            output.WriteLine("Walked in the SQLite run only.");
            return;
        }
        var blocks = ReadmeBlock.Read(await File.ReadAllTextAsync(RepoFiles.PathOf("README.md")));
        Assert.Contains(blocks, b => b.StartsTheService);
        // A curl that prints a 4xx and goes on would let the walk pass a step that failed for the reader too.
        var unguarded = blocks.Where(b => !b.RunsTheSuite)
            .SelectMany(b => b.Text.Split('\n').Where(l => System.Text.RegularExpressions.Regex.IsMatch(l, @"(^|\$\(|\| )curl ")))
            .Where(l => !l.Contains("--fail-with-body", StringComparison.Ordinal)).ToList();
        Assert.True(unguarded.Count == 0, "Every README curl says --fail-with-body:\n" + string.Join('\n', unguarded));

        var work = Directory.CreateTempSubdirectory("communitylead-readme-").FullName;
        var port = FreePort();
        var script = Script(blocks, port);
        await File.WriteAllTextAsync(Path.Combine(work, "walk.sh"), script);

        var start = new ProcessStartInfo("bash") { WorkingDirectory = RepoFiles.Root };
        start.ArgumentList.Add(Path.Combine(work, "walk.sh"));
        start.Environment["ConnectionStrings__CommunityLead"] = $"Data Source={Path.Combine(work, "walk.db")}";
        start.Environment["WALK_LOG"] = Path.Combine(work, "service.log");
        using var walk = new StartedProgram(start);
        var code = await walk.ExitCodeAsync(TimeSpan.FromMinutes(15));

        output.WriteLine(Tail(walk.Output + walk.Error, 6000));
        var walked = blocks.Count(b => !b.RunsTheSuite);
        output.WriteLine($"{walked} of {blocks.Count} shell blocks walked.");
        Assert.True(code == 0, $"The README walk stopped (exit {code}):\n{Tail(walk.Output + "\n" + walk.Error, 4000)}\n" +
                               $"Service log: {Tail(await ReadOrEmpty(Path.Combine(work, "service.log")), 2000)}");
        Assert.Contains("### end of the README", walk.Output);
    }

    /// <summary>The walk: each block as written, announced by its line; the service started in the background.</summary>
    private static string Script(IReadOnlyList<ReadmeBlock> blocks, int port)
    {
        var address = $"http://127.0.0.1:{port}";
        var text = new StringBuilder("""
            set -euo pipefail
            service=
            stop_service() { if [ -n "$service" ]; then kill -- -"$service" 2>/dev/null || kill "$service" 2>/dev/null || true; fi; }
            trap stop_service EXIT
            set -m

            """);
        foreach (var block in blocks)
        {
            if (block.RunsTheSuite) continue;
            text.AppendLine($"echo '### README line {block.Line}'");
            if (block.StartsTheService)
            {
                // As in its own terminal: in the background until the walk ends, then stopped.
                text.AppendLine($"{ReadmeBlock.ServiceCommand} -- --urls {address} >\"$WALK_LOG\" 2>&1 &");
                text.AppendLine("service=$!");
                text.AppendLine($"for i in $(seq 1 240); do curl -sf {address}/health >/dev/null && break; sleep 1; done");
                text.AppendLine($"curl -sf {address}/health >/dev/null");
                continue;
            }
            text.AppendLine(block.Text.Replace("http://127.0.0.1:5020", address, StringComparison.Ordinal));
        }
        text.AppendLine("echo '### end of the README'");
        return text.ToString();
    }

    private static int FreePort()
    {
        using var listener = new TcpListener(System.Net.IPAddress.Loopback, 0);
        listener.Start();
        return ((System.Net.IPEndPoint)listener.LocalEndpoint).Port;
    }

    private static async Task<string> ReadOrEmpty(string path) => File.Exists(path) ? await File.ReadAllTextAsync(path) : "";

    private static string Tail(string text, int length) => text.Length <= length ? text : text[^length..];
}
