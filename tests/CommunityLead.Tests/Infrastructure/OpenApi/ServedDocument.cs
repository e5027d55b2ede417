using CommunityLead.Tests.Deploy;

namespace CommunityLead.Tests.Infrastructure.OpenApi;

/// <summary>The API description as the service serves it, written to a file for the tools that read one.</summary>
internal static class ServedDocument
{
    public static async Task<string> FetchAsync()
    {
        using var app = new CommunityLeadFactory { Settings = { ["Swagger:Enabled"] = "true" } };
        var response = await app.CreateClient().GetAsync("/swagger/v1/swagger.json");
        response.EnsureSuccessStatusCode();
        return await response.Content.ReadAsStringAsync();
    }

    public static async Task<string> WriteAsync(string folder)
    {
        Directory.CreateDirectory(folder);
        var path = Path.Combine(folder, "openapi.json");
        await File.WriteAllTextAsync(path, await FetchAsync());
        return path;
    }

    /// <summary>
    /// The linters' folder with its packages installed from its lock file; .ci/run installs them first, and a
    /// developer's first run of the suite does it here (npm and its registry are part of a fresh machine).
    /// </summary>
    public static async Task<string> LintersAsync()
    {
        var folder = RepoFiles.PathOf("tools/openapi-lint");
        if (!File.Exists(Path.Combine(folder, "node_modules", ".bin", "redocly")))
        {
            var (code, output) = await RunAsync(folder, "npm", "ci", "--no-audit", "--no-fund");
            Assert.True(code == 0, $"npm ci in tools/openapi-lint failed: {output}");
        }
        return folder;
    }

    public static async Task<(int Code, string Output)> RunAsync(string folder, string program, params string[] arguments)
    {
        var start = new System.Diagnostics.ProcessStartInfo(program) { WorkingDirectory = folder };
        foreach (var argument in arguments) start.ArgumentList.Add(argument);
        using var run = new StartedProgram(start);
        var code = await run.ExitCodeAsync(TimeSpan.FromMinutes(3));
        return (code, run.Output + run.Error);
    }
}
