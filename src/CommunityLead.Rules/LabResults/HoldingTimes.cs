namespace CommunityLead.Rules.LabResults;

/// <summary>
/// Flags results handled too late. It never discards one: the result is kept and marked "outside holding
/// time", so the coordinator can decide whether to ask the household for a new sample.
/// </summary>
public static class HoldingTimes
{
    public static IReadOnlyList<HoldingFlag> Check(DateTimeOffset collectedAt, DateTimeOffset analyzedAt,
        DateTimeOffset? acidifiedAt, HoldingLimits limits)
    {
        ArgumentNullException.ThrowIfNull(limits);
        var flags = new List<HoldingFlag>();
        // AddMonths counts calendar months on the collector's own clock (31 Aug + 6 months = 28/29 Feb);
        // DateTimeOffset comparisons then use the absolute instant, so the lab's offset may differ.
        if (analyzedAt > collectedAt.AddMonths(limits.AnalysisWithinMonths))
            flags.Add(new(HoldingFlagCode.AnalyzedAfterHoldingTime,
                $"Analyzed {Span(analyzedAt - collectedAt)} after collection, later than the {limits.AnalysisWithinMonths}-month " +
                "holding time for metals; the result is kept but marked outside holding time."));
        if (acidifiedAt is { } acidified && acidified - collectedAt > limits.AcidificationWithin)
            flags.Add(new(HoldingFlagCode.AcidifiedLate,
                $"Acid was added {Span(acidified - collectedAt)} after collection, later than the {Span(limits.AcidificationWithin)} " +
                "allowed; the result is kept but marked outside holding time."));
        return flags;
    }

    private static string Span(TimeSpan t)
    {
        var days = (int)t.TotalDays;
        var text = days == 1 ? "1 day" : $"{days} days";
        return t.Hours == 0 ? text : $"{text} {t.Hours} h";
    }
}
