namespace CommunityLead.Api.Infrastructure;

/// <summary>
/// Finds files of seed-data/: beside the program when published (the build copies the folder there),
/// else in the repository, found by walking up from the working directory.
/// </summary>
public static class SeedData
{
    public static string? Find(string relativePath)
    {
        var beside = Path.Combine(AppContext.BaseDirectory, "seed-data", relativePath);
        if (File.Exists(beside) || Directory.Exists(beside)) return beside;
        for (var dir = new DirectoryInfo(Directory.GetCurrentDirectory()); dir is not null; dir = dir.Parent)
        {
            var candidate = Path.Combine(dir.FullName, "seed-data", relativePath);
            if (File.Exists(candidate) || Directory.Exists(candidate)) return candidate;
        }
        return null;
    }
}
