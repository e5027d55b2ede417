namespace CommunityLead.Rules.LabResults;

/// <summary>How long a water sample may wait before acid is added and before it is analysed.</summary>
public sealed record HoldingLimits
{
    /// <summary>Metals, lead and copper included: analyse within 6 months of collection (40 CFR 141.23(k)(2) table) [published].</summary>
    public int AnalysisWithinMonths { get; init; } = 6;

    /// <summary>Nitric acid to pH &lt; 2 within 14 days of collection (EPA FAQ; 40 CFR 141.86(b)(2)) [published].</summary>
    public TimeSpan AcidificationWithin { get; init; } = TimeSpan.FromDays(14);

    /// <summary>
    /// After acid is added the sample waits at least 16 h before analysis, so lead on particles and pipe scale
    /// dissolves; analysed sooner, the figure can read low (EPA Methods 200.7/200.8 §8.3) [from memory].
    /// </summary>
    public TimeSpan WaitAfterAcidification { get; init; } = TimeSpan.FromHours(16);
}
