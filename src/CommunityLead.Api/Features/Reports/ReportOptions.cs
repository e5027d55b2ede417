using CommunityLead.Rules.Reports;

namespace CommunityLead.Api.Features.Reports;

/// <summary>Settings of the "Reports" section.</summary>
public sealed class ReportOptions
{
    /// <summary>Counts from 1 to this are never shown (zero may be), after the CMS cell size suppression policy.</summary>
    public int SuppressionThreshold { get; set; } = CellSuppression.DefaultThreshold;
    /// <summary>
    /// The narrowest range (largest minus smallest possible value) that anyone holding every published number can
    /// narrow a hidden count to. 3 means a hidden 1 could be anything from 0 to 3 at least: the program's choice.
    /// </summary>
    public int MinimumHiddenRange { get; set; } = 3;
    /// <summary>No federal rule says how to take the 90th percentile when 0.9·n is not whole; this is the program's choice.</summary>
    public NinetiethRounding NinetiethRounding { get; set; } = NinetiethPercentile.DefaultRounding;
    /// <summary>Exactly five samples: the mean of the two highest (the rule for systems serving 100 people or fewer).</summary>
    public bool FiveSampleRule { get; set; } = true;
    /// <summary>
    /// How often the service looks, in the background, whether the store changed since the protected set was decided,
    /// and decides it again if so, so a report seldom waits for it. Zero turns the background look off: the first
    /// report after a change then decides the set itself.
    /// </summary>
    public TimeSpan DecideInBackgroundEvery { get; set; } = TimeSpan.FromSeconds(30);
}
