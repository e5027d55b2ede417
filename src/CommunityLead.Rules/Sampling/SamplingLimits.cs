namespace CommunityLead.Rules.Sampling;

/// <summary>How long water must and may stand before a first-draw sample, and how much clock error to forgive.</summary>
public sealed record SamplingLimits
{
    /// <summary>At least 6 hours unused before a first draw (EPA homeowner tap-sample instructions, 2024).</summary>
    public TimeSpan MinimumStanding { get; init; } = TimeSpan.FromHours(6);

    /// <summary>
    /// No federal maximum exists; EPA guidance calls 12 h or more "excessively long" and some state school
    /// programs accept up to 18 h. 18 h is common practice and a setting.
    /// </summary>
    public TimeSpan MaximumStanding { get; init; } = TimeSpan.FromHours(18);

    /// <summary>Phones and kitchen clocks drift; a collection time this little ahead of our clock is not "future".</summary>
    public TimeSpan ClockTolerance { get; init; } = TimeSpan.FromMinutes(15);
}
