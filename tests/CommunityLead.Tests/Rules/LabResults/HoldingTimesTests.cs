using System.Globalization;
using CommunityLead.Rules.LabResults;

namespace CommunityLead.Tests.Rules.LabResults;

public class HoldingTimesTests
{
    private static readonly HoldingLimits Limits = new();
    private static readonly DateTimeOffset Collected = At("2026-01-15T08:00:00-05:00");

    private static DateTimeOffset At(string text) => DateTimeOffset.Parse(text, CultureInfo.InvariantCulture);

    private static HoldingFlagCode[] Codes(DateTimeOffset collected, DateTimeOffset analyzed, DateTimeOffset? acidified) =>
        [.. HoldingTimes.Check(collected, analyzed, acidified, Limits).Select(f => f.Code)];

    // Metals holding time 6 months from collection [published: 40 CFR 141.23(k)(2) table].
    [Fact]
    public void Analysis_ExactlySixMonthsLater_IsNotFlagged() =>
        Assert.Empty(Codes(Collected, At("2026-07-15T08:00:00-05:00"), null));

    [Fact]
    public void Analysis_SixMonthsAndOneDayLater_IsFlaggedButKept()
    {
        var flags = HoldingTimes.Check(Collected, At("2026-07-16T08:00:00-05:00"), null, Limits);
        var flag = Assert.Single(flags);
        Assert.Equal(HoldingFlagCode.AnalyzedAfterHoldingTime, flag.Code);
        // 15 Jan → 16 Jul 2026 is 16 + 28 + 31 + 30 + 31 + 30 + 16 = 182 days.
        Assert.Equal("Analyzed 182 days after collection, later than the 6-month holding time for metals; " +
            "the result is kept but marked outside holding time.", flag.Message);
    }

    // Calendar months, not a fixed day count: 31 Aug + 6 months is 28 Feb (2027 is not a leap year).
    [Fact]
    public void Analysis_MonthEnd_UsesCalendarMonths()
    {
        var collected = At("2026-08-31T12:00:00+00:00");
        Assert.Empty(Codes(collected, At("2027-02-28T12:00:00+00:00"), null));
        Assert.Equal([HoldingFlagCode.AnalyzedAfterHoldingTime], Codes(collected, At("2027-02-28T12:00:01+00:00"), null));
    }

    // Acidification within 14 days of collection [published: EPA FAQ; 40 CFR 141.86(b)(2)].
    [Fact]
    public void Acidification_ExactlyFourteenDaysLater_IsNotFlagged() =>
        Assert.Empty(Codes(Collected, Collected.AddDays(20), Collected.AddDays(14)));

    [Fact]
    public void Acidification_FourteenDaysAndOneHourLater_IsFlagged()
    {
        var flag = Assert.Single(HoldingTimes.Check(Collected, Collected.AddDays(20), Collected.AddDays(14).AddHours(1), Limits));
        Assert.Equal(HoldingFlagCode.AcidifiedLate, flag.Code);
        Assert.Equal("Acid was added 14 days 1 h after collection, later than the 14 days allowed; " +
            "the result is kept but marked outside holding time.", flag.Message);
    }

    [Fact]
    public void Acidification_NotRecorded_HasNoAcidificationFlag() =>
        Assert.Empty(Codes(Collected, Collected.AddDays(30), null));

    [Fact]
    public void BothLate_HasBothFlags() =>
        Assert.Equal([HoldingFlagCode.AnalyzedAfterHoldingTime, HoldingFlagCode.AcidifiedLate],
            Codes(Collected, Collected.AddMonths(7), Collected.AddDays(15)));

    // Collected 08:00 −05:00 = 13:00Z; the lab in +02:00 writes 15:00 for the same instant six months on.
    [Fact]
    public void Analysis_LabInAnotherOffset_ComparesInstants()
    {
        Assert.Empty(Codes(Collected, At("2026-07-15T15:00:00+02:00"), null));
        Assert.Equal([HoldingFlagCode.AnalyzedAfterHoldingTime], Codes(Collected, At("2026-07-15T15:01:00+02:00"), null));
    }

    // 14 days after 13:00Z is 13:00Z, which the lab writes as 22:00 +09:00; the wall clocks alone would say 14 days 14 h.
    [Fact]
    public void Acidification_LabInAnotherOffset_ComparesInstants()
    {
        Assert.Empty(Codes(Collected, Collected.AddDays(20), At("2026-01-29T22:00:00+09:00")));
        Assert.Equal([HoldingFlagCode.AcidifiedLate], Codes(Collected, Collected.AddDays(20), At("2026-01-29T22:00:01+09:00")));
    }

    [Fact]
    public void Limits_Custom_AreUsed()
    {
        var limits = new HoldingLimits { AnalysisWithinMonths = 1, AcidificationWithin = TimeSpan.FromDays(2) };
        var flags = HoldingTimes.Check(Collected, Collected.AddMonths(1).AddDays(1), Collected.AddDays(3), limits);
        Assert.Equal([HoldingFlagCode.AnalyzedAfterHoldingTime, HoldingFlagCode.AcidifiedLate], flags.Select(f => f.Code));
    }
}
