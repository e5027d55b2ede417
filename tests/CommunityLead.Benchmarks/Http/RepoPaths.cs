namespace CommunityLead.Benchmarks.Http;

/// <summary>Where the service's own build is: the benchmarks run the program a deployment runs, not a test host.</summary>
internal static class RepoPaths
{
    public static string Root { get; } = FindRoot();

    /// <summary>The service's build of the same configuration as this program (Release when run as the README says).</summary>
    public static string ServiceDll
    {
        get
        {
            var configuration = AppContext.BaseDirectory.Contains($"{Path.DirectorySeparatorChar}Release{Path.DirectorySeparatorChar}") ? "Release" : "Debug";
            var dll = Path.Combine(Root, "src", "CommunityLead.Api", "bin", configuration, "net10.0", "CommunityLead.Api.dll");
            return File.Exists(dll) ? dll : throw new FileNotFoundException($"Build the service first ({configuration}).", dll);
        }
    }

    private static string FindRoot()
    {
        for (var dir = new DirectoryInfo(AppContext.BaseDirectory); dir is not null; dir = dir.Parent)
            if (File.Exists(Path.Combine(dir.FullName, "CommunityLead.sln"))) return dir.FullName;
        throw new InvalidOperationException("Run from within the repository.");
    }
}
