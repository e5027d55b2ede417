namespace CommunityLead.Rules.Reports;

/// <param name="Value">The measured result, or for a non-detect the limit it is reported below.</param>
/// <param name="BelowLimit">True for a non-detect, "&lt; Value": left-censored at Value.</param>
public sealed record CensoredValue(double Value, bool BelowLimit);
