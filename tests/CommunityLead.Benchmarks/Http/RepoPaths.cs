using System.Diagnostics;
using System.Runtime.InteropServices;

namespace CommunityLead.Benchmarks.Http;

/// <summary>Where the service's own build is: the benchmarks run the program a deployment runs, not a test host.</summary>
internal static class RepoPaths
{
    private static string? published;

    public static string Root { get; } = FindRoot();

    /// <summary>
    /// The service as deploy/ publishes it (Release, for this platform, so compiled ahead of time) once
    /// <see cref="PublishService"/> has run; before that, the Release build of the same configuration as this program.
    /// </summary>
    public static string ServiceDll
    {
        get
        {
            if (published is not null) return published;
            var configuration = AppContext.BaseDirectory.Contains($"{Path.DirectorySeparatorChar}Release{Path.DirectorySeparatorChar}") ? "Release" : "Debug";
            var dll = Path.Combine(Root, "src", "CommunityLead.Api", "bin", configuration, "net10.0", "CommunityLead.Api.dll");
            return File.Exists(dll) ? dll : throw new FileNotFoundException($"Build the service first ({configuration}).", dll);
        }
    }

    /// <summary>
    /// `dotnet publish -c Release -r &lt;this platform&gt;` into <paramref name="folder"/>, as deploy/README.md and the
    /// Dockerfile do (a publish for a platform is ReadyToRun: see the service's project file).
    /// </summary>
    public static void PublishService(string folder)
    {
        var rid = RuntimeInformation.RuntimeIdentifier;
        Console.WriteLine($"Publishing the service for {rid}, as a deployment does (about a minute)...");
        var start = new ProcessStartInfo("dotnet") { RedirectStandardOutput = true, RedirectStandardError = true, UseShellExecute = false };
        foreach (var argument in new[] { "publish", Path.Combine(Root, "src", "CommunityLead.Api"), "-c", "Release", "-r", rid, "-o", folder, "-v", "q" })
            start.ArgumentList.Add(argument);
        using var process = Process.Start(start)!;
        var output = process.StandardOutput.ReadToEndAsync();
        var error = process.StandardError.ReadToEndAsync();
        process.WaitForExit();
        if (process.ExitCode != 0) throw new InvalidOperationException($"dotnet publish failed: {output.Result}{error.Result}");
        published = Path.Combine(folder, "CommunityLead.Api.dll");
    }

    private static string FindRoot()
    {
        for (var dir = new DirectoryInfo(AppContext.BaseDirectory); dir is not null; dir = dir.Parent)
            if (File.Exists(Path.Combine(dir.FullName, "CommunityLead.sln"))) return dir.FullName;
        throw new InvalidOperationException("Run from within the repository.");
    }
}
