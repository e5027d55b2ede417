namespace CommunityLead.Rules.Reports;

/// <param name="Value">The quantile, or when <paramref name="IsUpperBound"/> the level it is known to be at or below.</param>
/// <param name="IsUpperBound">
/// True when the quantile falls among the non-detects, where no measured value pins it down: report "below Value".
/// </param>
public sealed record KaplanMeierQuantile(double Value, bool IsUpperBound);
