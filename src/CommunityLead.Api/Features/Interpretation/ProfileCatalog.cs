using CommunityLead.Api.Infrastructure;
using CommunityLead.Rules.Interpretation;
using CommunityLead.Rules.Kits;
using Microsoft.Extensions.Options;

namespace CommunityLead.Api.Features.Interpretation;

/// <summary>
/// The rule profiles, read and validated once at start-up. A broken file, or a configured profile that does
/// not exist, stops the service with a message naming the file and field (see Program.cs).
/// </summary>
public sealed class ProfileCatalog
{
    private readonly Dictionary<string, RuleProfile> profiles;
    private readonly InterpretationOptions options;

    public ProfileCatalog(IOptions<InterpretationOptions> settings)
    {
        options = settings.Value;
        var folder = string.IsNullOrWhiteSpace(options.ProfilesFolder) ? SeedData.Find("profiles") : options.ProfilesFolder;
        if (folder is null || !Directory.Exists(folder))
            throw new ProfileException(folder ?? "seed-data/profiles", "Interpretation:ProfilesFolder", "the folder of rule profiles was not found");
        var files = Directory.GetFiles(folder, "*.json").Order(StringComparer.Ordinal)
            .Select(f => (Path.GetFileName(f), File.ReadAllText(f)));
        profiles = ProfileReader.ReadAll(files).ToDictionary(p => p.Id);
        foreach (var (setting, id) in new[] { ("Interpretation:WaterProfile", options.WaterProfile), ("Interpretation:SoilProfile", options.SoilProfile) })
            if (!profiles.ContainsKey(id))
                throw new ProfileException(folder, setting, $"no profile '{id}'; there are: {string.Join(", ", profiles.Keys.Order())}");
    }

    public IReadOnlyCollection<RuleProfile> All => profiles.Values;

    public RuleProfile For(KitKind kind) => profiles[kind == KitKind.Soil ? options.SoilProfile : options.WaterProfile];

    public ProgramRules ProgramRules => options.ProgramRules;
}
