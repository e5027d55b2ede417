using CommunityLead.Rules.Households;
using CommunityLead.Rules.LabResults;
using CommunityLead.Rules.Sampling;

namespace CommunityLead.Rules.Interpretation;

public static partial class Interpreter
{
    /// <summary>
    /// A water kit's messages, in letter order: what the results are, what they point to, numbered steps, advice
    /// for this home, the usual cautions, and the closing. A Retest letter gives the reasons instead of the
    /// numbers and patterns (the coordinator still sees those in the findings); its steps still follow the
    /// findings, since protecting a household from a doubtful high value costs little.
    /// </summary>
    private static List<Message> WaterLetter(KitFacts kit, List<Judged> judged, Band band, IReadOnlyList<ValidityIssue> validity, Sources sources)
    {
        var home = kit.Household;
        var well = home.WaterSource == WaterSource.PrivateWell;
        var findings = judged.Select(j => j.Finding).ToList();
        var lead = findings.Where(f => f.Analyte == Analyte.Lead && f.Bottle != BottleType.Soil).ToList();
        var leadTop = lead.Count == 0 ? Band.NotDetected : lead.Max(f => f.Band);
        var vulnerableAndFound = IsVulnerable(home) && LeadDetected(lead);
        var messages = new List<Message>();
        if (kit.CorrectedAfterLetter) messages.Add(MessageCatalog.Corrected.Fill());

        messages.Add((band switch
        {
            Band.NotDetected => MessageCatalog.WaterNotDetected,
            Band.Low => MessageCatalog.WaterLow,
            // Advisory only because the test could not see low enough: say that, not "at or above".
            Band.Advisory when !lead.Any(f => f.Band >= Band.Advisory && !f.BelowReportingLimit)
                && !findings.Any(f => f.Analyte != Analyte.Lead && f.Band >= Band.Advisory) => MessageCatalog.WaterCannotTell,
            Band.Advisory => MessageCatalog.WaterAdvisory,
            Band.Action => MessageCatalog.WaterAction,
            Band.Urgent => MessageCatalog.WaterUrgent,
            _ => MessageCatalog.Retest,
        }).Fill());
        if (band == Band.Retest)
            messages.AddRange(validity.Select(v => v.Code).Distinct().Select(RetestReason));
        else
        {
            messages.AddRange(judged.SelectMany(Lines));
            if (findings.Any(f => f.Analyte == Analyte.Copper && f.Band >= Band.Action)) messages.Add(MessageCatalog.CopperHealth.Fill());
            messages.AddRange(SourceMessages(sources, well));
        }

        // Numbered steps. An urgent home is told not to use its tap water at all until we call, so it gets no
        // steps for drinking tap water (filtered water, cold water, running the tap); the filter is for later.
        if (band == Band.Retest) messages.Add(MessageCatalog.StepRetestWater.Fill());
        if (band != Band.Retest && leadTop == Band.Action) messages.Add(MessageCatalog.StepUseFiltered.Fill());
        if (leadTop >= Band.Advisory || vulnerableAndFound || sources.Pattern == SourcePattern.ServiceLineOrFurther)
            messages.Add(MessageCatalog.StepFilter.Fill());
        if (band != Band.Urgent)
        {
            messages.Add(MessageCatalog.StepColdWater.Fill());
            messages.Add(MessageCatalog.StepRunTap.Fill());
        }
        messages.Add(MessageCatalog.StepAerator.Fill());

        // This home: its service line (utility advice only where there is a utility), its well, its filter.
        if (!well && home.ServiceLine == ServiceLineMaterial.Lead) messages.Add(MessageCatalog.ServiceLineLead.Fill());
        if (!well && home.ServiceLine == ServiceLineMaterial.Galvanized) messages.Add(MessageCatalog.ServiceLineGalvanized.Fill());
        if (well && home.ServiceLine is ServiceLineMaterial.Lead or ServiceLineMaterial.Galvanized) messages.Add(MessageCatalog.WellPipe.Fill());
        if (well) messages.Add(MessageCatalog.WellAdvice.Fill());
        if (home.FilterInUse) messages.Add(MessageCatalog.FilterInUse.Fill());

        // The usual cautions; stronger ones for a child under 6 or a pregnancy at any detected lead.
        if (vulnerableAndFound) messages.Add(MessageCatalog.VulnerableWater.Fill());
        messages.Add(MessageCatalog.NoSafeLevel.Fill());
        messages.Add(MessageCatalog.NoBoil.Fill());
        messages.Add((vulnerableAndFound ? MessageCatalog.BloodTestSoon : MessageCatalog.BloodTest).Fill());
        messages.Add(Closing(home));
        return messages;
    }

    /// <summary>
    /// Pattern, sequential peak and fifth liter. A peak in bottle 1 points to the faucet; within the first liter
    /// to pipes in the home; after a liter or more to the service line or pipes further out [practice].
    /// </summary>
    private static IEnumerable<Message> SourceMessages(Sources sources, bool well)
    {
        if (sources.Pattern is { } pattern)
            yield return (pattern switch
            {
                SourcePattern.FaucetOrNearbyPlumbing => MessageCatalog.PatternFaucet,
                SourcePattern.ServiceLineOrFurther => well ? MessageCatalog.PatternFurtherWell : MessageCatalog.PatternFurther,
                _ => MessageCatalog.PatternNone,
            }).Fill();
        if (sources.Peak is { } peak)
        {
            var values = new Dictionary<string, Phrase>
            {
                ["position"] = MessageWords.Count(peak.Position),
                ["litres"] = MessageWords.Litres(peak.LitresBeforePeak),
                ["metres"] = MessageWords.Metres(peak.PipeMetres),
            };
            yield return (peak switch
            {
                _ when sources.PeakBand < Band.Advisory => MessageCatalog.PeakLow,
                { Position: 1 } => MessageCatalog.PeakFaucet,
                { LitresBeforePeak: < 1 } => MessageCatalog.PeakHomePipes,
                _ => well ? MessageCatalog.PeakFurtherWell : MessageCatalog.PeakFurther,
            }).Fill(values);
        }
        if (sources.FifthLiterHigher)
            yield return (well ? MessageCatalog.FifthLiterHigherWell : MessageCatalog.FifthLiterHigher).Fill();
    }
}
