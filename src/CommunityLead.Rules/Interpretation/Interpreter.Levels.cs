using CommunityLead.Rules.LabResults;
using CommunityLead.Rules.Sampling;

namespace CommunityLead.Rules.Interpretation;

public static partial class Interpreter
{
    private sealed record Threshold(double Value, string Meaning);

    /// <summary>
    /// The water thresholds for one analyte on the collection day. Where a profile holds several levels of one
    /// kind in effect (profile files forbid it; profiles built in code might not), the strictest counts.
    /// </summary>
    private sealed record WaterThresholds(Threshold? Caution, Threshold? Taste, Threshold? Action, Threshold? Urgent)
    {
        /// <summary>The lowest level in effect: what a low result is below, and what "high" means for patterns.</summary>
        public Threshold? Lowest => new[] { Caution, Taste, Action }.OfType<Threshold>().MinBy(t => t.Value);
    }

    private sealed class Levels(RuleProfile profile, DateOnly on, ProgramRules program)
    {
        public DateOnly On { get; } = on;

        /// <summary>
        /// Lead: caution = the stricter of the program's advisory and any profile Advisory level; action = the
        /// profile's action level; urgent = the program's setting. Copper: caution = a profile Advisory level,
        /// taste = the Aesthetic level (1.0 mg/L, 40 CFR 143.3), action = 1.3 mg/L (40 CFR 141.80(c)); no urgent.
        /// </summary>
        public WaterThresholds Water(Analyte analyte)
        {
            var caution = Strictest(analyte, Matrix.Water, LevelKind.Advisory);
            if (analyte == Analyte.Lead && program.AdvisoryLeadUgL is { } advisory && (caution is null || advisory < caution.Value))
                caution = new Threshold(advisory, "Program caution level");
            var urgent = analyte == Analyte.Lead
                ? new Threshold(program.UrgentLeadUgL, "Program urgent level: call the household now")
                : null;
            return new WaterThresholds(caution, Strictest(analyte, Matrix.Water, LevelKind.Aesthetic),
                Strictest(analyte, Matrix.Water, LevelKind.ActionLevel), urgent);
        }

        /// <summary>
        /// The soil level for where the sample was taken: levels whose AppliesTo is empty or names the place, and
        /// those kept for homes with another lead source only when this home has one; the strictest of those.
        /// A sample with no place recorded is judged as a play area, the strictest place, since children may
        /// play anywhere.
        /// </summary>
        public ProfileLevel? Soil(Analyte analyte, SoilLocation? location, bool otherLeadSource) =>
            SoilOfKind(LevelKind.SoilLevel, analyte, location, otherLeadSource);

        /// <summary>
        /// The soil screening level (a soil level of kind Advisory, such as EPA's 2024 residential 200 mg/kg, or
        /// 100 mg/kg with another lead source): stricter than the hazard standards and judged beside them, so a
        /// result under the hazard standard but over the screening level is not called low.
        /// </summary>
        public ProfileLevel? SoilScreening(Analyte analyte, SoilLocation? location, bool otherLeadSource) =>
            SoilOfKind(LevelKind.Advisory, analyte, location, otherLeadSource);

        private ProfileLevel? SoilOfKind(LevelKind kind, Analyte analyte, SoilLocation? location, bool otherLeadSource)
        {
            var place = location ?? SoilLocation.PlayArea;
            return InEffect(analyte, Matrix.Soil, kind)
                .Where(l => l.AppliesTo is not { Count: > 0 } || l.AppliesTo.Contains(place))
                .Where(l => !l.OnlyWithOtherLeadSource || otherLeadSource)
                .MinBy(l => l.Value);
        }

        private Threshold? Strictest(Analyte analyte, Matrix matrix, LevelKind kind) =>
            InEffect(analyte, matrix, kind).MinBy(l => l.Value) is { } level ? new Threshold(level.Value, level.Meaning) : null;

        // Our own filter on purpose (not ProfileLevels.InEffect): the dates are inclusive at both ends.
        private IEnumerable<ProfileLevel> InEffect(Analyte analyte, Matrix matrix, LevelKind kind) =>
            profile.Levels.Where(l => l.Analyte == analyte && l.Matrix == matrix && l.Kind == kind
                && (l.EffectiveFrom is not { } from || from <= On)
                && (l.EffectiveUntil is not { } until || On <= until));
    }
}
