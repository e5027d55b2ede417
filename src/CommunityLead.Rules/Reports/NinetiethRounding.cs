namespace CommunityLead.Rules.Reports;

/// <summary>
/// What to do when 0.9·n is not a whole number. 40 CFR 141.80(c)(3) is silent there and states differ
/// (../shared/DOMAIN.md §2) [published: no federal rule], so the report takes it as a setting.
/// </summary>
public enum NinetiethRounding
{
    /// <summary>Nearest rank; a fraction of exactly .5 goes up (22.5 → 23).</summary>
    RoundHalfUp,

    /// <summary>Nearest rank; a fraction of exactly .5 goes to the even rank (22.5 → 22, 13.5 → 14).</summary>
    RoundHalfToEven,

    /// <summary>Straight line between the results at the ranks on either side (Hyndman and Fan's type 4 at 0.9).</summary>
    Interpolate,

    /// <summary>The next rank up (10.8 → 11, 14.4 → 15): never lower than the other three.</summary>
    RoundUp,
}
