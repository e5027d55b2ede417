using CommunityLead.Rules.Sampling;

namespace CommunityLead.Rules.Interpretation;

public static partial class Interpreter
{
    /// <summary>
    /// A soil kit's messages: summary, one line per sample (or the retest reasons), why a lower level was used,
    /// where lead near the roof edge usually comes from, steps when any place is above its screening or hazard
    /// level or too close to call (or lead was found in a home with a young child or a pregnancy), the usual
    /// cautions and the closing. A soil letter names no water utility, service line or plumber (DOMAIN.md §5).
    /// </summary>
    private static List<Message> SoilLetter(KitFacts kit, List<Judged> judged, Band band, IReadOnlyList<ValidityIssue> validity)
    {
        var home = kit.Household;
        var soil = judged.Where(j => j.Finding.Bottle == BottleType.Soil).ToList();
        bool Concern(Finding f) => f.Band is >= Band.Advisory and < Band.Retest;
        var vulnerableAndFound = IsVulnerable(home) && LeadDetected(soil.Select(j => j.Finding));
        var messages = new List<Message>();
        if (kit.CorrectedAfterLetter) messages.Add(MessageCatalog.Corrected.Fill());

        messages.Add((band switch
        {
            Band.NotDetected => MessageCatalog.SoilNotDetected,
            Band.Low => MessageCatalog.SoilLow,
            Band.Advisory when soil.Any(j => j.Finding is { Band: Band.Advisory, Soil: SoilComparison.Inconclusive }) => MessageCatalog.SoilInconclusive,
            Band.Advisory => MessageCatalog.SoilAboveScreening,
            Band.Retest => MessageCatalog.Retest,
            _ => MessageCatalog.SoilAbove,
        }).Fill());
        if (band == Band.Retest)
            messages.AddRange(validity.Select(v => v.Code).Distinct().Select(RetestReason));
        else
        {
            messages.AddRange(judged.SelectMany(Lines));
            if (soil.FirstOrDefault(j => j.OtherSourceLevel) is { Finding.LevelValue: { } lower } used)
                messages.Add(MessageCatalog.SoilOtherSource.Fill(new Dictionary<string, Phrase>
                {
                    ["level"] = MessageWords.Amount(lower, used.Finding.Unit),
                }));
            // Near the drip line, soil lead mostly comes from old exterior paint [practice].
            if (soil.Any(j => j.Finding is { Location: SoilLocation.DripLine, Band: >= Band.Advisory and < Band.Retest }))
                messages.Add(MessageCatalog.SoilDripLinePaint.Fill());
        }

        if (band == Band.Retest) messages.Add(MessageCatalog.StepRetestSoil.Fill());
        if (soil.Any(j => Concern(j.Finding)) || vulnerableAndFound)
        {
            messages.Add(MessageCatalog.StepSoilPlay.Fill());
            messages.Add(MessageCatalog.StepSoilCover.Fill());
            messages.Add(MessageCatalog.StepSoilClean.Fill());
            messages.Add(MessageCatalog.StepSoilDust.Fill());
            messages.Add(MessageCatalog.StepSoilGarden.Fill());
            messages.Add(MessageCatalog.StepSoilPaint.Fill());
        }

        if (vulnerableAndFound) messages.Add(MessageCatalog.VulnerableSoil.Fill());
        messages.Add(MessageCatalog.NoSafeLevel.Fill());
        messages.Add((vulnerableAndFound ? MessageCatalog.BloodTestSoon : MessageCatalog.BloodTest).Fill());
        messages.Add(MessageCatalog.ClosingSoil.Fill());
        return messages;
    }
}
