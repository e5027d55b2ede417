namespace CommunityLead.Tests.Deploy;

/// <summary>
/// What deploy/README.md promises of the image, read from the Dockerfile itself: built in one stage and run
/// in another, as an unprivileged user, with its database on a volume and a health check.
/// </summary>
public class DockerfileTests
{
    private static readonly Dockerfile Image = Dockerfile.Load(RepoFiles.PathOf("deploy/Dockerfile"));

    [Fact]
    public void Dockerfile_Stages_BuildWithTheSdkAndRunOnTheAspNetRuntimeOnly()
    {
        Assert.True(Image.Stages.Count >= 2, "multi-stage: the SDK stays out of the image that runs");
        Assert.StartsWith("mcr.microsoft.com/dotnet/aspnet:", Image.Last("FROM"));
        Assert.Contains(Image.All("COPY"), copy => copy.StartsWith("--from=build "));
    }

    [Fact]
    public void Dockerfile_RuntimeStage_RunsAsANonRootUser()
    {
        var user = Image.Last("USER");
        Assert.NotNull(user);
        Assert.DoesNotContain(user.Split(':')[0], new[] { "root", "0" });
    }

    [Fact]
    public void Dockerfile_Entrypoint_IsDotnetRunningTheServiceFromItsWorkdir()
    {
        Assert.Equal(["dotnet", "CommunityLead.Api.dll"], Image.Entrypoint);
        Assert.Equal("/app", Image.Last("WORKDIR"));
    }

    [Fact]
    public void Dockerfile_Runtime_KeepsTheDatabaseOnTheVolumeAndChecksHealthOnTheExposedPort()
    {
        var volume = Assert.Single(Image.VolumePaths);
        var port = Assert.Single(Image.All("EXPOSE"));
        Assert.StartsWith($"Data Source={volume}/", Image.Env["ConnectionStrings__CommunityLead"]);
        Assert.EndsWith($":{port}", Image.Env["ASPNETCORE_URLS"]);
        Assert.Contains($"/{port}", Image.HealthcheckCommand);
        Assert.Contains("GET /health ", Image.HealthcheckCommand);
    }

    [Fact]
    public void Dockerfile_BuildContext_LeavesOutHostBuildOutputAndDatabases()
    {
        // `COPY src/ src/` would otherwise lay the host's obj/ (restore results with host paths) over the
        // container's own, and ship a developer's local database with households in it.
        var ignored = File.ReadAllLines(RepoFiles.PathOf(".dockerignore")).Select(l => l.Trim()).ToList();
        Assert.Contains("**/bin/", ignored);
        Assert.Contains("**/obj/", ignored);
        Assert.Contains("**/*.db", ignored);
    }
}
