namespace CommunityLead.Tests.Deploy;

/// <summary>
/// Deployment files are not copied to the test output, so they are read where they are kept: the
/// repository root, found by walking up from the test binaries to the solution file.
/// </summary>
internal static class RepoFiles
{
    public static string Root { get; } = FindRoot();

    public static string PathOf(string relativePath) => Path.Combine(Root, relativePath);

    private static string FindRoot()
    {
        for (var dir = new DirectoryInfo(AppContext.BaseDirectory); dir is not null; dir = dir.Parent)
        {
            if (File.Exists(Path.Combine(dir.FullName, "CommunityLead.sln"))) return dir.FullName;
        }
        throw new InvalidOperationException($"No CommunityLead.sln in {AppContext.BaseDirectory} or above it.");
    }
}
