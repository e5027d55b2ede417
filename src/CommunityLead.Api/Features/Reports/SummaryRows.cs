namespace CommunityLead.Api.Features.Reports;

/// <summary>A count, or null with Suppressed = true when showing it could identify a home (or let another hidden count be worked out).</summary>
public sealed record Cell(int? Value, bool Suppressed)
{
    public static Cell Of(int value, bool suppressed) => suppressed ? new(null, true) : new(value, false);
}

public sealed record BandCells(Cell NotDetected, Cell Low, Cell Advisory, Cell Action, Cell Urgent, Cell Retest);

public sealed record ShareWithInterval(double Proportion, double Low95, double High95, int Of);

public sealed record Ninetieth(double Value, int SampleCount, string Method, string Note);

public sealed record LeadQuantile(double Value, bool AtMost);

/// <remarks>
/// Copper bands and homes with a child under 6 are not columns of the protected table (a kit's counts form one tree):
/// they are null here, and shown as rows with groupBy=copper-band and groupBy=child-under-six.
/// </remarks>
public sealed record SummaryRow(
    string Group,
    Cell KitsIssued,
    Cell KitsReturned,
    Cell KitsAnalyzed,
    Cell KitsNeedingRetest,
    Cell? KitsFromHomesWithChildUnder6,
    BandCells Lead,
    BandCells? Copper,
    ShareWithInterval? ShareAtOrAboveActionLevel,
    Ninetieth? FirstDrawLead90thPercentile,
    LeadQuantile? FirstDrawLeadMedian,
    LeadQuantile? FirstDrawLead75thPercentile,
    double? DaysToLetterMedian,
    double? DaysToLetter90thPercentile,
    bool Suppressed);

/// <summary>For the data steward: the design protecting the report, its settings, and what it costs.</summary>
public sealed record SummaryProtection(
    string Design,
    int SuppressionThreshold,
    int MinimumHiddenRange,
    int HiddenInThisReport,
    int CountsInThisReport,
    int HiddenInProtectedSet,
    int CountsInProtectedSet,
    int NarrowestRangeProved,
    string Explanation);

public sealed record SummaryReport(
    string GroupBy,
    int SuppressionThreshold,
    string Unit,
    IReadOnlyList<SummaryRow> Rows,
    SummaryRow Total,
    IReadOnlyList<string> Notes)
{
    public string KitKind { get; init; } = "water";
    public string Period { get; init; } = "all";
    public SummaryProtection? Protection { get; init; }
}
