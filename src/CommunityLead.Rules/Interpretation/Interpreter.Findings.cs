using CommunityLead.Rules.Households;
using CommunityLead.Rules.LabResults;
using CommunityLead.Rules.Sampling;

namespace CommunityLead.Rules.Interpretation;

public static partial class Interpreter
{
    /// <summary>
    /// One water bottle and analyte. Below the reporting limit → NotDetected (censored: we never call it zero),
    /// unless the limit itself reaches the lowest level in effect: then Advisory, since the test could not see low enough.
    /// Otherwise the highest threshold reached: Urgent (lead only), Action, Advisory (the caution level, or copper's
    /// taste level), else Low. The level recorded is the one reached, or for Low and NotDetected the lowest level
    /// in effect (what the value is below); a detected Low result records the action level instead, since its letter
    /// says "below the action level" (never "low" as if that were safe).
    /// </summary>
    private static Judged JudgeWater(BottleResult result, Levels levels)
    {
        var t = levels.Water(result.Analyte);
        var unit = Analytes.NormalUnit(result.Analyte, Matrix.Water);
        // "< RL" with the limit at or above the lowest level says nothing about that level: the result could be just
        // under it. Calling it "not detected" would reassure wrongly, so it is judged as the caution band instead.
        var blind = result.BelowReportingLimit && t.Lowest is { } lowest && AtOrAbove(result.ReportingLimit, lowest.Value);
        var (band, level, taste) = blind ? (Band.Advisory, t.Lowest, false)
            : result.BelowReportingLimit ? (Band.NotDetected, t.Lowest, false) : result.Value switch
        {
            var v when t.Urgent is { } u && AtOrAbove(v, u.Value) => (Band.Urgent, u, false),
            var v when t.Action is { } a && AtOrAbove(v, a.Value) => (Band.Action, a, false),
            var v when t.Taste is { } s && AtOrAbove(v, s.Value) => (Band.Advisory, s, true),
            var v when t.Caution is { } c && AtOrAbove(v, c.Value) => (Band.Advisory, c, false),
            _ => (Band.Low, t.Action ?? t.Lowest, false),
        };
        var finding = new Finding(result.Bottle, result.Position, result.Location, result.Analyte, result.Value, unit,
            result.BelowReportingLimit, band, level?.Value, level?.Meaning);
        return new Judged(finding, result.ReportingLimit, t.Action?.Value, taste, Urgent: t.Urgent?.Value);
    }

    /// <summary>
    /// One soil sample, compared with the hazard standard for its place and with the screening level (if the profile
    /// has one). With an uncertainty σ (one standard deviation, portable XRF): Above if value − 2σ &gt; level, Below if
    /// value + 2σ &lt; level, else Inconclusive → confirm with a lab sample (DOMAIN.md §5 [practice; no published rule]).
    /// Without σ (or σ = 0) the value is compared directly, and equal counts as above, as everywhere else.
    /// The decisive level: the hazard standard when the sample reaches it or is too close to call (Action,
    /// Advisory); else the screening level (Advisory when above it or too close, Low below it); else the hazard
    /// standard (Low below it). Below the reporting limit → NotDetected when the limit is under the decisive level,
    /// else Inconclusive and Advisory (the test can't see low enough to tell).
    /// </summary>
    private static Judged JudgeSoil(BottleResult result, Levels levels, HouseholdContext household)
    {
        var other = HasOtherLeadSource(household);
        var hazard = levels.Soil(result.Analyte, result.Location, other);
        var screening = levels.SoilScreening(result.Analyte, result.Location, other);
        var margin = result.Uncertainty is { } sigma && sigma > 0 ? 2 * sigma : (double?)null;
        SoilComparison? Compare(ProfileLevel? level) => level is null ? null
            : result.BelowReportingLimit ? (result.ReportingLimit < level.Value ? SoilComparison.Below : SoilComparison.Inconclusive)
            : margin is { } m ? (result.Value - m > level.Value ? SoilComparison.Above
                : result.Value + m < level.Value ? SoilComparison.Below : SoilComparison.Inconclusive)
            : AtOrAbove(result.Value, level.Value) ? SoilComparison.Above : SoilComparison.Below;

        var (level, comparison) = Compare(hazard) is SoilComparison.Above or SoilComparison.Inconclusive
            ? (hazard, Compare(hazard))
            : screening is not null ? (screening, Compare(screening)) : (hazard, Compare(hazard));
        var band = result.BelowReportingLimit && comparison != SoilComparison.Inconclusive ? Band.NotDetected : comparison switch
        {
            SoilComparison.Above when level == hazard => Band.Action,
            SoilComparison.Above or SoilComparison.Inconclusive => Band.Advisory,
            _ => Band.Low,
        };
        var finding = new Finding(result.Bottle, result.Position, result.Location, result.Analyte, result.Value,
            Analytes.NormalUnit(result.Analyte, Matrix.Soil), result.BelowReportingLimit, band, level?.Value, level?.Meaning, comparison,
            ScreeningLevel: level is not null && level == screening, HazardLevel: hazard?.Value);
        return new Judged(finding, result.ReportingLimit, Margin: margin, OtherSourceLevel: level?.OnlyWithOtherLeadSource ?? false,
            Hazard: hazard?.Value, Screening: finding.ScreeningLevel);
    }

    /// <summary>
    /// Whether the EPA's lower soil screening level for homes with another lead source applies (EPA Updated
    /// Residential Soil Lead Guidance, 2024; DOMAIN.md §5). From what we know of the home: a lead or galvanized
    /// service line, or a home built before 1978, when the US banned lead paint for homes [memory: CPSC,
    /// 16 CFR 1303]. An unknown year is not assumed old: that would put every home with a blank form on the
    /// lower level.
    /// </summary>
    private static bool HasOtherLeadSource(HouseholdContext household) =>
        household.ServiceLine is ServiceLineMaterial.Lead or ServiceLineMaterial.Galvanized || household.YearBuilt < 1978;
}
