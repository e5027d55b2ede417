using CommunityLead.Api.Infrastructure;

namespace CommunityLead.Api.Features.Reports;

/// <summary>What the report says about itself: for whoever reads it, and for the data steward who answers for it.</summary>
public static class SummaryNotes
{
    public const string Design = "one protected table set";

    public static IReadOnlyList<string> For(SummaryRequest request, ReportOptions options, string timeZone)
    {
        var t = options.SuppressionThreshold;
        return
        [
            $"Counts from 1 to {t} are hidden, and so are other counts wherever needed so that no hidden count can be worked out from this or any other report.",
            $"Months, quarters and years are the program's calendar ({timeZone}): a kit counts in the month it was collected there, or issued if not yet collected.",
            "Water and soil kits are counted apart; soil results are screening results, not a hazard assessment.",
            "Copper bands and homes with a child under 6 are shown as rows: group by copper-band or child-under-six.",
            "The 90th percentile uses the method of 40 CFR 141.80(c)(3) and is informational only: the homes tested are volunteers, not a compliance sample.",
            $"When 0.9 × n is not a whole number, the rank is found by: {KebabEnum.Name(options.NinetiethRounding)}.",
            "Median and 75th percentile of lead treat results below the reporting limit as censored (Kaplan–Meier), never as half the limit.",
            "A statistic is shown only for a group whose counts are all shown and that has more homes than the threshold.",
            "Kits that were re-issued for the same home are counted once each.",
            "These counts describe volunteer homes only. Questions about health belong with the local health department and the " +
                "family's doctor; questions about the water system with the water utility; plumbing work with a licensed plumber.",
        ];
    }

    public static SummaryProtection Protection(Dictionary<ReportKitKind, KindTable> tables, SummaryRequest request, ReportOptions options,
        int hiddenHere, int countsHere)
    {
        var kinds = request.GroupBy == SummaryGrouping.KitKind ? tables.Values.ToList() : [tables[request.Kind]];
        var narrowest = kinds.Min(k => k.Table.NarrowestRange);
        return new SummaryProtection(Design, options.SuppressionThreshold, options.MinimumHiddenRange, hiddenHere, countsHere,
            kinds.Sum(k => k.Table.HiddenCells), kinds.Sum(k => k.Table.NonZeroCells),
            narrowest == int.MaxValue ? 0 : narrowest,
            "Every report is a look-up in one table of every month, quarter and year by area, water source, age band, service " +
            "line, overall band, copper band and child under 6, protected once as a whole. Counts from 1 to the threshold are " +
            "hidden; then, for each, the service builds other possible sets of kits (a kit moved to another area or month, " +
            "with one moved back) that give every shown number exactly as published, and hides every count that differs " +
            $"in any of them, until each hidden count could lie anywhere in a range at least {options.MinimumHiddenRange} wide. " +
            "What you lose: the hidden cells, including some large ones hidden so that a small one cannot be worked out, " +
            "statistics of any group with a hidden count, and any query crossing two household dimensions.");
    }
}
