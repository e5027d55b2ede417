using CommunityLead.Rules.Sampling;

namespace CommunityLead.Rules.Interpretation;

public static partial class Interpreter
{
    /// <summary>The line a finding gets in the letter, with its values written for each language.</summary>
    private static IEnumerable<Message> Lines(Judged judged)
    {
        var f = judged.Finding;
        var values = new Dictionary<string, Phrase>
        {
            ["bottle"] = MessageWords.Bottle(f.Bottle, f.Position),
            ["location"] = MessageWords.Location(f.Location),
            ["metal"] = MessageWords.Metal(f.Analyte),
            ["result"] = MessageWords.Amount(f.Value, f.Unit),
            ["rl"] = MessageWords.Amount(judged.ReportingLimit, f.Unit),
        };
        if (f.LevelValue is { } level) values["level"] = MessageWords.Amount(level, f.Unit);
        if (judged.Margin is { } margin) values["margin"] = MessageWords.Amount(margin, f.Unit);
        if (judged.Hazard is { } hazard) values["hazard"] = MessageWords.Amount(hazard, f.Unit);
        if (f.Band == Band.Urgent)
        {
            values["level"] = MessageWords.Amount(judged.ActionLevel ?? f.LevelValue ?? 0, f.Unit);
            values["urgent"] = MessageWords.Amount(judged.Urgent ?? f.LevelValue ?? 0, f.Unit);
        }

        if (f.Bottle == BottleType.Soil)
        {
            yield return (f.BelowReportingLimit, f.Soil) switch
            {
                (true, SoilComparison.Inconclusive) => MessageCatalog.SoilReportingLimitAtLevel.Fill(values),
                (true, _) => MessageCatalog.SoilResultNotDetected.Fill(values),
                (false, null) => MessageCatalog.SoilResultMeasured.Fill(values),
                (false, SoilComparison.Above) when judged is { Screening: true, Hazard: not null } => MessageCatalog.SoilResultAboveScreening.Fill(values),
                (false, SoilComparison.Above) => MessageCatalog.SoilResultAbove.Fill(values),
                (false, SoilComparison.Below) when judged.Screening => MessageCatalog.SoilResultBelowScreening.Fill(values),
                (false, SoilComparison.Below) => MessageCatalog.SoilResultBelow.Fill(values),
                // Inconclusive always has a margin when detected: without one the comparison is direct.
                _ => MessageCatalog.SoilResultInconclusive.Fill(values),
            };
            yield break;
        }

        // A result below the reporting limit is reported as such, whatever band the limit puts it in.
        yield return f.BelowReportingLimit ? MessageCatalog.ResultNotDetected.Fill(values) : f.Band switch
        {
            Band.NotDetected => MessageCatalog.ResultNotDetected.Fill(values),
            Band.Low when f.LevelValue is null => MessageCatalog.ResultMeasured.Fill(values),
            Band.Low when judged.ActionLevel == f.LevelValue => MessageCatalog.ResultLow.Fill(values),
            Band.Low => MessageCatalog.ResultBelowLevel.Fill(values),
            Band.Advisory when judged.Taste => MessageCatalog.CopperTaste.Fill(values),
            Band.Advisory => MessageCatalog.ResultAdvisory.Fill(values),
            Band.Action => MessageCatalog.ResultAction.Fill(values),
            _ => MessageCatalog.ResultUrgent.Fill(values),
        };
        if (f.BelowReportingLimit && f.LevelValue is { } lowest && AtOrAbove(judged.ReportingLimit, lowest))
            yield return MessageCatalog.ReportingLimitAtLevel.Fill(values);
    }

    private static Message RetestReason(ValidityIssueCode code) => (code switch
    {
        ValidityIssueCode.StandingTimeShort => MessageCatalog.RetestStandingShort,
        ValidityIssueCode.OutsideHoldingTime => MessageCatalog.RetestHoldingTime,
        ValidityIssueCode.QcHeld => MessageCatalog.RetestQcHeld,
        _ => MessageCatalog.RetestCollection,
    }).Fill();

    private static Message Closing(HouseholdContext household) =>
        (household.WaterSource == Households.WaterSource.PrivateWell ? MessageCatalog.ClosingWell : MessageCatalog.ClosingPublic).Fill();

    /// <summary>
    /// Results a retest letter still shows: any that already reached a level. The sample is doubted, not the
    /// danger, and a short standing time biases lead low (DOMAIN.md §6 [practice]).
    /// </summary>
    private static IEnumerable<Message> RetestHighLines(List<Judged> judged, IReadOnlyList<ValidityIssue> validity)
    {
        var high = judged.Where(j => j.Finding is { BelowReportingLimit: false, Band: >= Band.Advisory and < Band.Retest } && !j.Taste).ToList();
        if (high.Count == 0) yield break;
        yield return (validity.All(v => v.Code == ValidityIssueCode.StandingTimeShort)
            ? MessageCatalog.RetestHighShortStanding : MessageCatalog.RetestHighOther).Fill();
        foreach (var line in high.SelectMany(Lines)) yield return line;
    }
}
