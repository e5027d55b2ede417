using CommunityLead.Rules.Kits;
using CommunityLead.Rules.LabResults;
using CommunityLead.Rules.Sampling;

namespace CommunityLead.Rules.Interpretation;

/// <summary>
/// What a kit's results mean for its household. Pure: the same facts and profile give the same answer.
/// Only levels in effect on the day the kit was collected count (both ends of a level's dates included).
/// A value equal to a level is "at or above" it; "equal" allows 1e-9 relative, so a result converted from
/// mg/L (0.015 × 1000) is not pushed below 15 by floating-point noise.
/// </summary>
public static partial class Interpreter
{
    public static Interpretation Interpret(KitFacts kit, RuleProfile profile, ProgramRules program)
    {
        var levels = new Levels(profile, kit.CollectedOn, program);
        var judged = kit.Results.Select(r => r.Bottle == BottleType.Soil ? JudgeSoil(r, levels, kit.Household) : JudgeWater(r, levels))
            .OrderBy(j => BottleOrder(j.Finding.Bottle)).ThenBy(j => j.Finding.Position).ThenBy(j => j.Finding.Location)
            .ThenBy(j => j.Finding.Analyte)
            .ToList();
        var findings = judged.Select(j => j.Finding).ToList();

        // A kit with nothing to judge can't be reassuring: the household samples again.
        IReadOnlyList<ValidityIssue> validity = findings.Count == 0
            ? [.. kit.Validity, new ValidityIssue(ValidityIssueCode.CollectionInvalid, "The kit has no results to interpret.")]
            : kit.Validity;

        // The highest finding counts; for first-liter + fifth-liter kits that is how "the higher one counts"
        // under the LCRI (89 FR 86418; DOMAIN.md §3). Any validity issue makes the kit Retest, but its findings
        // keep their own bands for the coordinator.
        var band = validity.Count > 0 ? Band.Retest : findings.Max(f => f.Band);
        var sources = Sources.Find(kit, findings, levels, program);
        var implausible = Implausible(findings, levels, program.Plausibility);
        var flags = Flags(kit, findings, band, sources, implausible.Count > 0);
        var messages = kit.Kind == KitKind.Soil
            ? SoilLetter(kit, judged, band, validity)
            : WaterLetter(kit, judged, band, validity, sources);
        return new Interpretation(band, profile.Id, profile.Version, findings, sources.Pattern, sources.Peak, validity, messages, flags)
        {
            Implausible = implausible,
        };
    }

    /// <summary>Letter order: first liter, fifth liter, flushed, the sequential bottles, soil.</summary>
    private static int BottleOrder(BottleType bottle) => bottle switch
    {
        BottleType.FirstDraw => 0,
        BottleType.FifthLiter => 1,
        BottleType.Flushed => 2,
        BottleType.Sequential => 3,
        _ => 4,
    };

    private static bool AtOrAbove(double value, double level) => value >= level - Math.Abs(level) * 1e-9;

    private static bool IsVulnerable(HouseholdContext household) => household.ChildUnder6 || household.Pregnant;

    private static bool LeadDetected(IEnumerable<Finding> findings) =>
        findings.Any(f => f.Analyte == Analyte.Lead && !f.BelowReportingLimit);

    /// <summary>A finding plus what its message needs beyond the Finding record.</summary>
    /// <param name="Urgent">Lead in water: the program's urgent level, named beside the action level in an urgent line.</param>
    /// <param name="Hazard">Soil: the hazard standard for the sample's place, named beside a screening level it exceeds.</param>
    /// <param name="Screening">Soil: the finding was judged against the screening level, not the hazard standard.</param>
    private sealed record Judged(
        Finding Finding,
        double ReportingLimit,
        double? ActionLevel = null,
        bool Taste = false,
        double? Margin = null,
        bool OtherSourceLevel = false,
        double? Urgent = null,
        double? Hazard = null,
        bool Screening = false);
}
