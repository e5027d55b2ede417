using CommunityLead.Rules.Households;
using CommunityLead.Rules.Interpretation;
using CommunityLead.Rules.LabResults;
using CommunityLead.Rules.Sampling;

namespace CommunityLead.Api.Features.Letters.Composing;

/// <summary>
/// One scale per lead result, so people see where they stand. Water: the caution level (if any), the action
/// level, and the urgent level only when the result is near it (else the scale would stretch and squash the rest).
/// Soil: the level for the place the sample came from.
/// </summary>
internal static class LeadScales
{
    /// <summary>A result at or above this share of the urgent level shows it [our choice]; 1.5 × 0.7 &gt; 1 keeps it on the scale.</summary>
    public const double NearUrgentShare = 0.7;

    /// <summary>The scale runs to a round number at least this many times the larger of the result and the levels.</summary>
    public const double Headroom = 1.5;

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
        var marked = lead.Select(f => (Finding: f, Marks: Marks(f, levels.Lead))).ToList();
        // One end for every water scale of a letter, so bars can be compared at a glance; soil keeps its own.
        var waterTop = marked.Where(m => m.Finding.Bottle != BottleType.Soil)
            .SelectMany(m => m.Marks.Select(x => x.Value).Append(m.Finding.Value)).DefaultIfEmpty(0).Max();
        return [.. marked.Select(m => Scale(m.Finding, m.Marks, language,
            m.Finding.Bottle == BottleType.Soil ? m.Marks.Select(x => x.Value).Append(m.Finding.Value).Max() : waterTop))];
    }

    private static LeadScale Scale(Finding f, List<(double Value, Phrase Label)> marks, LetterLanguage language, double top) =>
        new(SampleWords.Sample(f).In(language), f.Value, SampleWords.ScaleValue(f).In(language),
            [.. marks.Select(m => new ScaleMark(m.Value, m.Label.In(language)))], RoundUp(Headroom * top), f.Unit);

    private static List<(double Value, Phrase Label)> Marks(Finding f, WaterLevels lead)
    {
        if (f.Bottle == BottleType.Soil)
            return f.LevelValue is { } soil ? [(soil, SampleWords.SoilLevel)] : [];
        var marks = new List<(double, Phrase)>();
        if (lead.Caution is { } caution) marks.Add((caution, SampleWords.CautionLevel));
        if (lead.Action is { } action) marks.Add((action, SampleWords.ActionLevel));
        // Only the findings' own levels are known (no profile given): show the lowest one, by its honest name.
        if (marks.Count == 0 && f.LevelValue is { } lowest) marks.Add((lowest, ResultRows.Name(f, lowest, lead)));
        if (lead.Urgent is { } urgent && !f.BelowReportingLimit && f.Value >= NearUrgentShare * urgent)
            marks.Add((urgent, SampleWords.UrgentLevel));
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
