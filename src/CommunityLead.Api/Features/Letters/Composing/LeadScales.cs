using CommunityLead.Rules.Households;
using CommunityLead.Rules.Interpretation;
using CommunityLead.Rules.LabResults;
using CommunityLead.Rules.Sampling;

namespace CommunityLead.Api.Features.Letters.Composing;

/// <summary>
/// One scale per lead result, so people see where they stand, and one axis per matrix in a letter: every water bar
/// has the same end, break and levels (so a larger value never looks smaller), and soil bars share their own axis.
/// Water: the caution level (if any), the action level, and the urgent level when some result is near it (else the
/// axis would stretch and squash the rest). Soil: each bar the level for the place its sample came from.
/// </summary>
internal static class LeadScales
{
    /// <summary>A result at or above this share of the urgent level shows it [our choice]; 1.5 × 0.7 &gt; 1 keeps it on the scale.</summary>
    public const double NearUrgentShare = 0.7;

    /// <summary>The scale runs to a round number at least this many times the larger of the result and the levels.</summary>
    public const double Headroom = 1.5;

    /// <summary>
    /// The axis breaks when, drawn to size, the highest level would sit in the first quarter of the bar [our choice]:
    /// closer in, the levels' ticks and labels crowd together and a level reads as if it were zero.
    /// </summary>
    public const double BreakWhenLevelsBelowShare = 0.25;

    private static readonly double[] RoundSteps = [1, 1.5, 2, 2.5, 3, 4, 5, 6, 8, 10];

    /// <summary>A sequential profile has many bottles; the table lists them all, the scales show the first and the peak.</summary>
    public const int MostScales = 3;

    public static IReadOnlyList<LeadScale> For(IReadOnlyList<Finding> findings, LetterLevels levels, LetterLanguage language)
    {
        var lead = findings.Where(f => f.Analyte == Analyte.Lead).ToList();
        if (lead.Count > MostScales)
        {
            var peak = lead.MaxBy(f => f.Value)!;
            lead = [.. lead.Take(1).Append(peak).Distinct()];
        }
        var water = lead.Where(f => f.Bottle != BottleType.Soil).ToList();
        var soil = lead.Where(f => f.Bottle == BottleType.Soil).ToList();
        var waterMarks = WaterMarks(water, levels.Lead);
        var waterAxis = Axis(water, waterMarks.Select(m => m.Value));
        var soilAxis = Axis(soil, soil.SelectMany(f => SoilMarks(f).Select(m => m.Value)));
        return [.. lead.Select(f => f.Bottle == BottleType.Soil
            ? Scale(f, SoilMarks(f), soilAxis, language)
            : Scale(f, waterMarks, waterAxis, language))];
    }

    private static LeadScale Scale(Finding f, List<(double Value, Phrase Label)> marks, (double Maximum, double? BreakAt) axis, LetterLanguage language) =>
        new(SampleWords.Sample(f).In(language), f.Value, SampleWords.ScaleValue(f).In(language),
            [.. marks.Select(m => new ScaleMark(m.Value, m.Label.In(language)))], axis.Maximum, f.Unit, axis.BreakAt);

    /// <summary>
    /// The end of an axis, and where it breaks: to size up to a round number past the highest level, then squeezed to
    /// a round number past the highest result, when drawing it all to size would crowd the levels at the left.
    /// </summary>
    public static (double Maximum, double? BreakAt) Axis(IEnumerable<Finding> findings, IEnumerable<double> levels)
    {
        var highestLevel = levels.DefaultIfEmpty(0).Max();
        var highestValue = findings.Select(f => f.Value).DefaultIfEmpty(0).Max();
        var toSize = RoundUp(Headroom * Math.Max(highestLevel, highestValue));
        if (highestLevel <= 0 || highestLevel >= BreakWhenLevelsBelowShare * toSize)
            return (toSize, null);
        var breakAt = RoundUp(Headroom * highestLevel);
        return breakAt >= toSize ? (toSize, null) : (toSize, breakAt);
    }

    /// <summary>The same marks on every water bar: the kit's levels, and the urgent level if any result is near it.</summary>
    private static List<(double Value, Phrase Label)> WaterMarks(List<Finding> water, WaterLevels lead)
    {
        var marks = new List<(double Value, Phrase Label)>();
        if (water.Count == 0) return marks;
        if (lead.Caution is { } caution) marks.Add((caution, SampleWords.CautionLevel));
        if (lead.Action is { } action) marks.Add((action, SampleWords.ActionLevel));
        // Only the findings' own levels are known (no profile given): show the lowest one, by its honest name.
        if (marks.Count == 0 && water.Select(f => f.LevelValue).Where(v => v is not null).Min() is { } lowest)
            marks.Add((lowest, ResultRows.Name(water.First(f => f.LevelValue == lowest), lowest, lead)));
        if (lead.Urgent is { } urgent && water.Any(f => !f.BelowReportingLimit && f.Value >= NearUrgentShare * urgent)
            && marks.All(m => m.Value != urgent))
            marks.Add((urgent, SampleWords.UrgentLevel));
        return marks;
    }

    /// <summary>
    /// The level that decided, and the hazard standard beside a screening level: a 940 mg/kg drip-line sample is
    /// above the 200 screening level and below the 1,200 hazard standard, and the household should see both.
    /// </summary>
    private static List<(double Value, Phrase Label)> SoilMarks(Finding f)
    {
        if (f.LevelValue is not { } level) return [];
        if (!f.ScreeningLevel) return [(level, SampleWords.SoilLevel)];
        List<(double Value, Phrase Label)> marks = [(level, SampleWords.SoilScreeningLevel)];
        if (f.HazardLevel is { } hazard && hazard != level) marks.Add((hazard, SampleWords.SoilHazardLevel));
        return marks;
    }

    /// <summary>The smallest of 1, 1.5, 2, 2.5, 3, 4, 5, 6, 8 times a power of ten that is at least <paramref name="value"/>.</summary>
    public static double RoundUp(double value)
    {
        if (value <= 0) return 1;
        var magnitude = Math.Pow(10, Math.Floor(Math.Log10(value)));
        foreach (var step in RoundSteps)
        {
            var candidate = Math.Round(step * magnitude, 10);
            if (candidate >= value * (1 - 1e-12)) return candidate;
        }
        return Math.Round(10 * magnitude, 10);
    }
}
