using CommunityLead.Rules.Reports;

namespace CommunityLead.Api.Features.Reports;

/// <summary>A count, or null with Suppressed = true when it is small enough (or close enough to one) to identify a home.</summary>
public sealed record Cell(int? Value, bool Suppressed)
{
    public static Cell Of(int value, bool suppressed) => suppressed ? new(null, true) : new(value, false);
}

public sealed record BandCells(Cell NotDetected, Cell Low, Cell Advisory, Cell Action, Cell Urgent, Cell Retest);

public sealed record ShareWithInterval(double Proportion, double Low95, double High95, int Of);

public sealed record Ninetieth(double Value, int SampleCount, string Method, string Note);

public sealed record LeadQuantile(double Value, bool AtMost);

public sealed record SummaryRow(
    string Group,
    Cell KitsIssued,
    Cell KitsReturned,
    Cell KitsAnalyzed,
    Cell KitsNeedingRetest,
    Cell KitsFromHomesWithChildUnder6,
    BandCells Lead,
    BandCells Copper,
    ShareWithInterval? ShareAtOrAboveActionLevel,
    Ninetieth? FirstDrawLead90thPercentile,
    LeadQuantile? FirstDrawLeadMedian,
    LeadQuantile? FirstDrawLead75thPercentile,
    double? DaysToLetterMedian,
    double? DaysToLetter90thPercentile,
    bool Suppressed);

public sealed record SummaryReport(
    string GroupBy,
    int SuppressionThreshold,
    string Unit,
    IReadOnlyList<SummaryRow> Rows,
    SummaryRow Total,
    IReadOnlyList<string> Notes);
