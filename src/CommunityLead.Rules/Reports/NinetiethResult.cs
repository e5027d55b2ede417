namespace CommunityLead.Rules.Reports;

/// <param name="Value">The 90th percentile, in the unit of the values given.</param>
/// <param name="SampleCount">How many results it was taken from.</param>
/// <param name="Method">Plain words saying which rule gave it, for a report's footnote.</param>
public sealed record NinetiethResult(double Value, int SampleCount, string Method);
