namespace CommunityLead.Rules.Reports;

/// <param name="Proportion">The observed share, successes / n.</param>
/// <param name="Low">Lower end of the interval, never below 0.</param>
/// <param name="High">Upper end of the interval, never above 1.</param>
public sealed record ProportionInterval(double Proportion, double Low, double High);
