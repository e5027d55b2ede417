using CommunityLead.Rules.Interpretation;
using CommunityLead.Rules.LabResults;
using static CommunityLead.Tests.Rules.Interpretation.ProfileJson;

namespace CommunityLead.Tests.Rules.Interpretation;

/// <summary>Which levels count on a day: both ends of a level's dates are included.</summary>
public class ProfileLevelsTests
{
    private static readonly RuleProfile Dated = ProfileReader.Read(FileName, With(p =>
    {
        Level(p, 0)["effectiveUntil"] = "2036-01-11";
        Levels(p).Add(LeadInWater(5, from: "2036-01-12"));
        Levels(p).Add(LeadInWater(1, from: "2030-01-01", until: "2030-12-31", kind: "advisory"));
    }));

    [Theory]
    [InlineData("2029-12-31", new[] { 10.0 })]
    [InlineData("2030-01-01", new[] { 10.0, 1.0 })]
    [InlineData("2030-12-31", new[] { 10.0, 1.0 })]
    [InlineData("2031-01-01", new[] { 10.0 })]
    [InlineData("2036-01-11", new[] { 10.0 })]
    [InlineData("2036-01-12", new[] { 5.0 })]
    [InlineData("9999-12-31", new[] { 5.0 })]
    [InlineData("0001-01-01", new[] { 10.0 })]
    public void InEffect_LeadInWater_FollowsTheDates(string on, double[] values) =>
        Assert.Equal(values, ProfileLevels.InEffect(Dated, Analyte.Lead, Matrix.Water, DateOnly.Parse(on)).Select(l => l.Value));

    [Fact]
    public void InEffect_OtherAnalyteAndMatrix_AreLeftOut()
    {
        var on = new DateOnly(2026, 4, 10);
        Assert.Equal([1.3], ProfileLevels.InEffect(Dated, Analyte.Copper, Matrix.Water, on).Select(l => l.Value));
        Assert.Equal([400.0], ProfileLevels.InEffect(Dated, Analyte.Lead, Matrix.Soil, on).Select(l => l.Value));
        Assert.Empty(ProfileLevels.InEffect(Dated, Analyte.Copper, Matrix.Soil, on));
    }
}
