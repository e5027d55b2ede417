using CommunityLead.Rules.Interpretation;
using CommunityLead.Rules.LabResults;
using CommunityLead.Rules.Sampling;

namespace CommunityLead.Api.Features.Letters.Composing;

/// <summary>The water levels of one analyte by kind; null where the kit had none of that kind.</summary>
public sealed record WaterLevels(double? Caution = null, double? Taste = null, double? Action = null, double? Urgent = null);

/// <summary>
/// The levels a kit was judged against, by kind, so the letter can name each one ("Action level 10 µg/L") and draw
/// them on the lead scales. The interpretation records only the one level each finding was compared with, not
/// its kind, nor levels the finding did not reach (a 40 µg/L result says nothing of the 50 µg/L urgent level).
/// </summary>
public sealed record LetterLevels(WaterLevels Lead, WaterLevels Copper, string? ProfileId = null, int? ProfileVersion = null)
{
    /// <summary>
    /// Exactly the levels the interpreter used: the strictest of each kind in effect on the collection day (both
    /// ends included), the program's lead advisory where it is stricter than the profile's, and the program's
    /// urgent level for lead. The same rules as the interpreter's own (private) level table.
    /// </summary>
    public static LetterLevels For(RuleProfile profile, ProgramRules program, DateOnly collectedOn)
    {
        double? Strictest(Analyte analyte, LevelKind kind) => ProfileLevels.InEffect(profile, analyte, Matrix.Water, collectedOn)
            .Where(l => l.Kind == kind).Select(l => (double?)l.Value).Min();

        var leadCaution = Strictest(Analyte.Lead, LevelKind.Advisory);
        if (program.AdvisoryLeadUgL is { } advisory && (leadCaution is null || advisory < leadCaution)) leadCaution = advisory;
        var lead = new WaterLevels(leadCaution, null, Strictest(Analyte.Lead, LevelKind.ActionLevel), program.UrgentLeadUgL);
        var copper = new WaterLevels(Strictest(Analyte.Copper, LevelKind.Advisory), Strictest(Analyte.Copper, LevelKind.Aesthetic),
            Strictest(Analyte.Copper, LevelKind.ActionLevel));
        return new LetterLevels(lead, copper, profile.Id, profile.Version);
    }

    /// <summary>
    /// What the findings alone tell: a finding's band names the kind of level it reached. A low or not-detected
    /// finding was compared with the lowest level in effect, whose kind can't be told apart, so it stays unnamed
    /// (the letter calls it "the lowest level we use", as the result message does).
    /// </summary>
    public static LetterLevels FromFindings(IReadOnlyList<Finding> findings)
    {
        WaterLevels Reached(Analyte analyte)
        {
            var water = findings.Where(f => f.Analyte == analyte && f.Bottle != BottleType.Soil).ToList();
            double? At(Band band) => water.Where(f => f.Band == band).Select(f => f.LevelValue).FirstOrDefault(v => v is not null);
            // Copper at the advisory band reached its taste level whenever the profile has one (it is judged first).
            return analyte == Analyte.Copper
                ? new WaterLevels(Taste: At(Band.Advisory), Action: At(Band.Action))
                : new WaterLevels(Caution: At(Band.Advisory), Action: At(Band.Action), Urgent: At(Band.Urgent));
        }
        return new LetterLevels(Reached(Analyte.Lead), Reached(Analyte.Copper));
    }

    public WaterLevels Of(Analyte analyte) => analyte == Analyte.Lead ? Lead : Copper;
}
