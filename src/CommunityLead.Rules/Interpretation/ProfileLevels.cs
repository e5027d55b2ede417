using CommunityLead.Rules.LabResults;

namespace CommunityLead.Rules.Interpretation;

/// <summary>Which of a profile's levels count on a given day (e.g. the EU lead value drops to 5 µg/L on 2036-01-12).</summary>
public static class ProfileLevels
{
    public static IReadOnlyList<ProfileLevel> InEffect(RuleProfile profile, Analyte analyte, Matrix matrix, DateOnly on) =>
        profile.Levels.Where(l => l.Analyte == analyte && l.Matrix == matrix && IsInEffect(l, on)).ToList();

    /// <summary>Both ends are included: a level with effectiveUntil 2036-01-11 still counts on that day.</summary>
    public static bool IsInEffect(ProfileLevel level, DateOnly on) =>
        (level.EffectiveFrom is not { } from || from <= on) && (level.EffectiveUntil is not { } until || on <= until);
}
