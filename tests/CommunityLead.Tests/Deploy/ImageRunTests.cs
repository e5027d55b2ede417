using System.Net;
using System.Net.Http.Headers;
using Microsoft.Data.Sqlite;

namespace CommunityLead.Tests.Deploy;

/// <summary>
/// No container engine runs where the suite runs, so the image's commands are run here the way the container
/// runs them (see <see cref="ImageRun"/>): if the image's settings, documented commands or health check were
/// wrong, this is where it shows.
/// </summary>
public class ImageRunTests
{
    private static readonly Dockerfile Image = Dockerfile.Load(RepoFiles.PathOf("deploy/Dockerfile"));

    [Fact]
    public async Task Image_DocumentedCommandsThenService_ShareTheVolumeAndPassTheHealthCheck()
    {
        var port = Assert.Single(Image.All("EXPOSE"));
        using var image = new ImageRun(Image, Assert.Single(Image.VolumePaths), port);

        var keys = await image.RunAsync(DocumentedArguments("keys create"));
        Assert.True(keys.Exit == 0, keys.Error);
        var key = keys.Output.Split('\n', StringSplitOptions.RemoveEmptyEntries | StringSplitOptions.TrimEntries)[^1];
        Assert.StartsWith("clk_", key);

        var demo = await image.RunAsync(DocumentedArguments("demo"));
        Assert.True(demo.Exit == 0, demo.Error);

        var service = image.Start();
        await image.WaitUntilAnsweringAsync(service);
        var healthcheck = Image.HealthcheckCommand!.Replace($"/{port}", $"/{image.Port}");
        Assert.Equal(0, await image.ShellAsync(healthcheck));
        // The key the command made signs in to the service: both used the database on the volume.
        using var http = new HttpClient { BaseAddress = image.Url };
        http.DefaultRequestHeaders.Authorization = new AuthenticationHeaderValue("Bearer", key);
        Assert.Equal(HttpStatusCode.OK, (await http.GetAsync("/api/kits")).StatusCode);
        Assert.Contains("Hosting environment: Production", service.Output);
        // Swagger UI is off in the image (deploy/README.md).
        Assert.Equal(HttpStatusCode.NotFound, (await http.GetAsync("/swagger/index.html")).StatusCode);

        service.Dispose();
        Assert.NotEqual(0, await image.ShellAsync(healthcheck)); // the check notices a stopped service
        var database = new SqliteConnectionStringBuilder(image.Environment["ConnectionStrings__CommunityLead"]).DataSource;
        Assert.Equal(image.DataFolder, Path.GetDirectoryName(database));
        Assert.True(File.Exists(database), $"{database} was not created");
        Assert.True(CountHouseholds(database) > 0, "the demo households are in the volume's database");
    }

    /// <summary>The arguments after the service name in docker-compose.yml's own instructions.</summary>
    private static string[] DocumentedArguments(string command)
    {
        const string prefix = "docker compose run --rm communitylead ";
        var line = File.ReadLines(RepoFiles.PathOf("docker-compose.yml"))
            .Select(l => l.TrimStart('#', ' '))
            .First(l => l.StartsWith(prefix + command));
        var end = line.IndexOf(" #", StringComparison.Ordinal);
        return line[prefix.Length..(end < 0 ? line.Length : end)].Split(' ', StringSplitOptions.RemoveEmptyEntries);
    }

    private static long CountHouseholds(string database)
    {
        using var connection = new SqliteConnection($"Data Source={database}");
        connection.Open();
        using var count = connection.CreateCommand();
        count.CommandText = "SELECT count(*) FROM Households";
        return (long)count.ExecuteScalar()!;
    }
}
