using CommunityLead.Rules.Interpretation;
using CommunityLead.Rules.LabResults;
using CommunityLead.Rules.Sampling;

namespace CommunityLead.Tests.Rules.Interpretation;

/// <summary>The profiles the repository ships, read from seed-data/profiles as the service reads them.</summary>
internal static class ProfileFiles
{
    public static readonly string Folder = Path.Combine(RepositoryRoot(), "seed-data", "profiles");

    public static IReadOnlyList<(string FileName, string Json)> All() =>
        Directory.GetFiles(Folder, "*.json").Order(StringComparer.Ordinal)
            .Select(path => (Path.GetFileName(path), File.ReadAllText(path)))
            .ToList();

    public static RuleProfile Load(string id) =>
        ProfileReader.Read($"{id}.json", File.ReadAllText(Path.Combine(Folder, $"{id}.json")));

    /// <summary>The one level of that analyte, matrix and kind (and soil location, and date when given).</summary>
    public static ProfileLevel Single(
        RuleProfile profile, Analyte analyte, Matrix matrix, LevelKind kind,
        SoilLocation? at = null, bool otherLeadSource = false, DateOnly? on = null) =>
        Assert.Single(profile.Levels, l =>
            l.Analyte == analyte && l.Matrix == matrix && l.Kind == kind
            && l.OnlyWithOtherLeadSource == otherLeadSource
            && (at is null || l.AppliesTo is not { Count: > 0 } || l.AppliesTo.Contains(at.Value))
            && (on is null || ProfileLevels.IsInEffect(l, on.Value)));

    // Tests run from bin/<configuration>/<framework>; the solution file marks the repository root.
    private static string RepositoryRoot()
    {
        for (var folder = new DirectoryInfo(AppContext.BaseDirectory); folder is not null; folder = folder.Parent)
            if (File.Exists(Path.Combine(folder.FullName, "CommunityLead.sln"))) return folder.FullName;
        throw new InvalidOperationException($"No CommunityLead.sln above {AppContext.BaseDirectory}.");
    }
}
