using System.Globalization;
using CommunityLead.Api.Data.Entities;
using CommunityLead.Rules.Interpretation;
using CommunityLead.Rules.LabResults;
using KitOutcome = CommunityLead.Rules.Interpretation.Interpretation;

namespace CommunityLead.Api.Features.Interpretation;

/// <summary>The one line a coordinator reads on the attention list, saying what to do.</summary>
public static class AttentionText
{
    public static string For(AttentionFlag flag, KitOutcome outcome) => flag switch
    {
        AttentionFlag.Urgent => $"Urgent result ({Worst(outcome)}): call the household now. {HeldLetter}",
        AttentionFlag.Implausible => Fit(ImplausibleText.All(outcome.Implausible), "", HeldLetter),
        AttentionFlag.ActionLevelVulnerableHome =>
            $"At or above the action level ({Worst(outcome)}) in a home with a child under 6 or a pregnancy: call first and offer help.",
        AttentionFlag.ActionLevel => $"At or above the action level ({Worst(outcome)}): call and offer help.",
        AttentionFlag.SuspectedServiceLine => "Lead points to the service line or pipes further out: tell the household and the utility.",
        AttentionFlag.RetestNeeded => Fit([.. outcome.Validity.Select(v => v.Reason).Distinct()], "The sample needs to be taken again:", ""),
        _ => "Corrected result after the letter: a new letter is needed.",
    };

    /// <summary>Said on the items that hold a letter back (LetterRelease): resolving them is what releases it.</summary>
    public const string HeldLetter = "The letter waits until this item is resolved with a note.";

    /// <summary>
    /// Every reason while the line has room. A sequential kit can carry a reason per bottle (30 of them), more
    /// than the stored line holds; the rest are counted, and the kit's interpretation lists them all. One reason
    /// always fits: each is a stored collection flag (300 characters at most) or a sentence of our own with a
    /// figure or two in it.
    /// </summary>
    private static string Fit(IReadOnlyList<string> reasons, string opening, string closing)
    {
        string Line(int shown)
        {
            var text = string.Join(" ", reasons.Take(shown).Prepend(opening).Where(t => t.Length > 0));
            var more = reasons.Count - shown;
            text = more == 0 ? text : $"{text} (And {more} more on the kit's interpretation.)";
            return closing.Length == 0 ? text : $"{text} {closing}";
        }
        var shown = reasons.Count;
        while (shown > 1 && Line(shown).Length > AttentionItem.DetailMaxLength) shown--;
        return Line(shown);
    }

    /// <summary>The most serious finding (lead before copper at the same band), e.g. "22.3 µg/L lead".</summary>
    private static string Worst(KitOutcome outcome)
    {
        var top = outcome.Findings.Where(f => f.Band != Band.Retest)
            .OrderByDescending(f => f.Band).ThenBy(f => f.Analyte != Analyte.Lead).ThenByDescending(f => f.Value).FirstOrDefault();
        return top is null ? "see results"
            : $"{top.Value.ToString("0.###", CultureInfo.InvariantCulture)} {top.Unit} {KebabName(top.Analyte)}";
    }

    private static string KebabName(Analyte analyte) => analyte == Analyte.Lead ? "lead" : "copper";
}
