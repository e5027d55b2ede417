using CommunityLead.Rules.Households;
using CommunityLead.Rules.LabResults;
using CommunityLead.Rules.Sampling;

namespace CommunityLead.Rules.Interpretation;

public static partial class Interpreter
{
    /// <summary>
    /// A water kit's messages, in letter order: what the results are, what they point to, numbered steps, advice
    /// for this home, the usual cautions, and the closing. A Retest letter gives the reasons instead of the
    /// numbers and patterns, except results that already reached a level, which it shows; its steps still follow
    /// the findings, since protecting a household from a doubtful high value costs little.
    /// One plan per lead band, never two that disagree (DOMAIN.md §6): urgent → bottled water only until a retest;
    /// action level → filtered or bottled water; caution level → a certified filter. Running the tap is advice
    /// only below the action level and only where the lead does not point to the service line or pipes further
    /// out (running the tap draws that very water). Copper gets copper's own plan, lead advice only where lead
    /// calls for it.
    /// </summary>
    private static List<Message> WaterLetter(KitFacts kit, List<Judged> judged, Band band, IReadOnlyList<ValidityIssue> validity, Sources sources)
    {
        var home = kit.Household;
        var well = home.WaterSource == WaterSource.PrivateWell;
        var findings = judged.Select(j => j.Finding).ToList();
        var lead = findings.Where(f => f.Analyte == Analyte.Lead && f.Bottle != BottleType.Soil).ToList();
        var leadTop = lead.Count == 0 ? Band.NotDetected : lead.Max(f => f.Band);
        var copperAction = findings.Any(f => f.Analyte == Analyte.Copper && f.Band is >= Band.Action and < Band.Retest);
        var lineSource = ServiceLineSource(home, sources);
        var vulnerableLead = IsVulnerable(home) && leadTop >= Band.Advisory;
        var messages = new List<Message>();
        if (kit.CorrectedAfterLetter) messages.Add(MessageCatalog.Corrected.Fill());

        if (band == Band.Retest)
        {
            messages.Add(MessageCatalog.Retest.Fill());
            messages.AddRange(validity.Select(v => v.Code).Distinct().Select(RetestReason));
            messages.AddRange(RetestHighLines(judged, validity));
        }
        else
        {
            var leadSummary = LeadSummary(lead, leadTop).Fill();
            // Copper first when copper is what the letter is about.
            if (copperAction && leadTop < Band.Advisory) messages.Add(MessageCatalog.WaterCopperAction.Fill());
            messages.Add(leadSummary);
            if (copperAction && leadTop >= Band.Advisory) messages.Add(MessageCatalog.WaterCopperAction.Fill());
            messages.AddRange(judged.SelectMany(Lines));
            if (copperAction) messages.Add(MessageCatalog.CopperHealth.Fill());
            if (LeadDetected(lead)) messages.AddRange(SourceMessages(sources, well));
        }

        messages.AddRange(Steps(home, lead, leadTop, copperAction, lineSource, band == Band.Retest));

        // This home: its service line (utility advice only where there is a utility), its well, its filter. An urgent
        // home is told to use bottled water, not its filter, until the retest.
        if (!well && home.ServiceLine == ServiceLineMaterial.Lead) messages.Add(MessageCatalog.ServiceLineLead.Fill());
        if (!well && home.ServiceLine == ServiceLineMaterial.Galvanized) messages.Add(MessageCatalog.ServiceLineGalvanized.Fill());
        if (well && home.ServiceLine is ServiceLineMaterial.Lead or ServiceLineMaterial.Galvanized) messages.Add(MessageCatalog.WellPipe.Fill());
        if (well) messages.Add(MessageCatalog.WellAdvice.Fill());
        if (home.FilterInUse && leadTop != Band.Urgent) messages.Add(MessageCatalog.FilterInUse.Fill());

        // The usual cautions; stronger ones for a child under 6 or a pregnancy where lead reached a level.
        if (leadTop == Band.Urgent)
        {
            messages.Add(MessageCatalog.FilterTestedLevel.Fill());
            if (IsVulnerable(home)) messages.Add(MessageCatalog.VulnerableUrgent.Fill());
        }
        else if (vulnerableLead) messages.Add(MessageCatalog.VulnerableWater.Fill());
        messages.Add(MessageCatalog.NoSafeLevel.Fill());
        messages.Add(MessageCatalog.NoBoil.Fill());
        messages.Add((vulnerableLead ? MessageCatalog.BloodTestSoon : MessageCatalog.BloodTest).Fill());
        messages.Add(Closing(home));
        return messages;
    }

    /// <summary>The summary for lead alone; copper has its own line.</summary>
    private static MessageTemplate LeadSummary(List<Finding> lead, Band leadTop) => leadTop switch
    {
        Band.NotDetected => MessageCatalog.WaterNotDetected,
        Band.Low => MessageCatalog.WaterLow,
        // Advisory only because the test could not see low enough: say that, not "at or above".
        Band.Advisory when !lead.Any(f => f.Band >= Band.Advisory && !f.BelowReportingLimit) => MessageCatalog.WaterCannotTell,
        Band.Advisory => MessageCatalog.WaterAdvisory,
        Band.Action => MessageCatalog.WaterAction,
        _ => MessageCatalog.WaterUrgent,
    };

    /// <summary>Numbered steps: the retest first, then the one plan for the lead band, then copper's, then the aerator.</summary>
    private static IEnumerable<Message> Steps(HouseholdContext home, List<Finding> lead, Band leadTop, bool copperAction, bool lineSource, bool retest)
    {
        var well = home.WaterSource == WaterSource.PrivateWell;
        var leadFound = LeadDetected(lead);
        if (retest) yield return MessageCatalog.StepRetestWater.Fill();
        switch (leadTop)
        {
            case Band.Urgent:
                yield return MessageCatalog.StepBottledOnly.Fill();
                break;
            case Band.Action:
                yield return MessageCatalog.StepUseFiltered.Fill();
                yield return MessageCatalog.StepFilter.Fill();
                break;
            case Band.Advisory:
                yield return MessageCatalog.StepFilter.Fill();
                break;
            default:
                // Under every level, but the lead may come from the service line: a filter, not running the tap.
                if ((lineSource && leadFound) || home.ServiceLine == ServiceLineMaterial.Lead) yield return MessageCatalog.StepFilter.Fill();
                break;
        }
        if (leadTop != Band.Urgent) yield return MessageCatalog.StepColdWater.Fill();
        var mayRunTap = leadTop < Band.Action && !lineSource;
        // Copper builds up in standing water in copper pipes, so its own step says why the tap is run.
        if (mayRunTap) yield return (copperAction ? MessageCatalog.StepCopperRunTap : MessageCatalog.StepRunTap).Fill();
        if (lineSource && leadFound && !well && home.ServiceLine is not (ServiceLineMaterial.Lead or ServiceLineMaterial.Galvanized))
            yield return MessageCatalog.StepAskUtility.Fill();
        if (copperAction)
        {
            yield return MessageCatalog.StepCopperFormula.Fill();
            // An urgent home uses bottled water, not a filter, until the retest.
            if (leadTop != Band.Urgent) yield return MessageCatalog.StepCopperFilter.Fill();
        }
        yield return MessageCatalog.StepAerator.Fill();
    }

    /// <summary>
    /// Whether running the tap would draw the lead's source: a known lead service line, or results that point past
    /// the home's own pipes (flushed as high as the first draw, a sequential peak after the first liter, a fifth
    /// liter above the first). DOMAIN.md §6 [practice].
    /// </summary>
    private static bool ServiceLineSource(HouseholdContext home, Sources sources) =>
        home.ServiceLine == ServiceLineMaterial.Lead
        || sources.Pattern == SourcePattern.ServiceLineOrFurther
        || (sources.Peak is { LitresBeforePeak: >= 1 } && sources.PeakBand >= Band.Advisory)
        || sources.FifthLiterHigher;

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
