using CommunityLead.Rules.LabResults;
using CommunityLead.Rules.Sampling;

namespace CommunityLead.Rules.Interpretation;

public static partial class Interpreter
{
    /// <summary>
    /// What needs a person, most urgent first (the order AttentionFlag is declared in). Flags read the findings
    /// even when the kit is Retest, so a doubtful but very high value still reaches someone. A result at or above
    /// an action level (lead, copper, or soil above its hazard level) raises one action flag: the vulnerable-home
    /// one where a child under 6 lives or someone is pregnant, the plain one otherwise; an urgent result raises
    /// Urgent as well. Service line suspected: the ServiceLineOrFurther pattern, a sequential peak after the first
    /// liter, or a fifth liter above the first — each only with lead at the caution level or above. An implausible
    /// result raises Implausible beside whatever its value raises: until the lab confirms it, it may be real.
    /// </summary>
    private static IReadOnlyList<AttentionFlag> Flags(KitFacts kit, IReadOnlyList<Finding> findings, Band band, Sources sources,
        bool implausible)
    {
        var flags = new SortedSet<AttentionFlag>();
        if (findings.Any(f => f.Band == Band.Urgent)) flags.Add(AttentionFlag.Urgent);
        if (implausible) flags.Add(AttentionFlag.Implausible);
        if (findings.Any(f => f.Band is Band.Action or Band.Urgent))
            flags.Add(IsVulnerable(kit.Household) ? AttentionFlag.ActionLevelVulnerableHome : AttentionFlag.ActionLevel);
        if (SuspectServiceLine(findings, sources)) flags.Add(AttentionFlag.SuspectedServiceLine);
        if (band == Band.Retest) flags.Add(AttentionFlag.RetestNeeded);
        if (kit.CorrectedAfterLetter) flags.Add(AttentionFlag.CorrectedAfterLetter);
        return [.. flags];
    }

    private static bool SuspectServiceLine(IReadOnlyList<Finding> findings, Sources sources)
    {
        var leadAboveLow = findings.Any(f => f is { Analyte: Analyte.Lead, Bottle: BottleType.FirstDraw or BottleType.Flushed }
            && f.Band >= Band.Advisory);
        return (sources.Pattern == SourcePattern.ServiceLineOrFurther && leadAboveLow)
            || (sources.Peak is { LitresBeforePeak: >= 1 } && sources.PeakBand >= Band.Advisory)
            || sources.FifthLiterHigher;
    }
}
