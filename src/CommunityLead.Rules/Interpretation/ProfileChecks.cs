using CommunityLead.Rules.LabResults;
using CommunityLead.Rules.Sampling;

namespace CommunityLead.Rules.Interpretation;

/// <summary>Checks that need all of a profile's levels at once.</summary>
internal static class ProfileChecks
{
    /// <summary>
    /// Two levels of the same analyte, matrix and kind that share a soil location (no list = every location) and a
    /// day would leave the rules to guess which one counts. The 100 ppm screening level used only where another lead
    /// source exists is a different level from the plain 200 ppm one, so that flag is part of what must differ.
    /// </summary>
    public static void NoOverlaps(string fileName, IReadOnlyList<ProfileLevel> levels)
    {
        for (var later = 1; later < levels.Count; later++)
            for (var earlier = 0; earlier < later; earlier++)
            {
                var (a, b) = (levels[earlier], levels[later]);
                if (a.Analyte != b.Analyte || a.Matrix != b.Matrix || a.Kind != b.Kind
                    || a.OnlyWithOtherLeadSource != b.OnlyWithOtherLeadSource || !ShareLocation(a, b)) continue;
                var firstShared = Max(Start(a), Start(b));
                if (firstShared > Min(End(a), End(b))) continue;
                var when = a.EffectiveFrom is null && b.EffectiveFrom is null ? "from the start" : $"on {firstShared:yyyy-MM-dd}";
                throw new ProfileException(fileName, $"levels[{later}]",
                    $"is a second {ProfileNames.Of(b.Kind)} for {ProfileNames.Of(b.Analyte)} in {ProfileNames.Of(b.Matrix)} in effect " +
                    $"{when}, like levels[{earlier}]; give them dates that do not overlap (effectiveUntil / effectiveFrom)");
            }
    }

    /// <summary>
    /// Every water profile needs a lead action level on every day: it is what a water result is judged by, even in a
    /// profile built around a stricter advisory (schools and child care).
    /// </summary>
    public static void LeadActionLevelAlways(string fileName, IReadOnlyList<ProfileLevel> levels)
    {
        if (!levels.Any(l => l.Matrix == Matrix.Water)) return;
        var actionLevels = levels
            .Where(l => l is { Analyte: Analyte.Lead, Matrix: Matrix.Water, Kind: LevelKind.ActionLevel })
            .OrderBy(Start)
            .ToList();
        if (actionLevels.Count == 0)
            throw new ProfileException(fileName, "levels", "has water levels but no lead action level for water; every water profile needs one");

        // Walk the levels in date order; the first day nothing covers is a gap.
        var uncovered = DateOnly.MinValue;
        foreach (var level in actionLevels)
        {
            if (Start(level) > uncovered) throw Gap(fileName, uncovered, Start(level));
            if (End(level) == DateOnly.MaxValue) return;
            uncovered = Max(uncovered, End(level).AddDays(1));
        }
        throw Gap(fileName, uncovered, null);
    }

    private static ProfileException Gap(string fileName, DateOnly from, DateOnly? nextStart) =>
        new(fileName, "levels", nextStart is { } next
            ? $"has no lead action level for water from {Day(from)} to {next.AddDays(-1):yyyy-MM-dd}; a water profile needs one on every date"
            : $"has no lead action level for water from {from:yyyy-MM-dd} on; a water profile needs one on every date");

    private static string Day(DateOnly day) => day == DateOnly.MinValue ? "the start" : day.ToString("yyyy-MM-dd");

    private static bool ShareLocation(ProfileLevel a, ProfileLevel b) =>
        a.AppliesTo is not { Count: > 0 } || b.AppliesTo is not { Count: > 0 } || a.AppliesTo.Intersect(b.AppliesTo).Any();

    private static DateOnly Start(ProfileLevel level) => level.EffectiveFrom ?? DateOnly.MinValue;
    private static DateOnly End(ProfileLevel level) => level.EffectiveUntil ?? DateOnly.MaxValue;
    private static DateOnly Max(DateOnly a, DateOnly b) => a > b ? a : b;
    private static DateOnly Min(DateOnly a, DateOnly b) => a < b ? a : b;
}
