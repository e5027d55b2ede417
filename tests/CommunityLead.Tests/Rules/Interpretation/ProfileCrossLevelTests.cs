using System.Text.Json.Nodes;
using CommunityLead.Rules.Interpretation;
using static CommunityLead.Tests.Rules.Interpretation.ProfileJson;

namespace CommunityLead.Tests.Rules.Interpretation;

/// <summary>What only the levels together can break: overlaps, the lead action level, ids across files.</summary>
public class ProfileCrossLevelTests
{
    [Fact]
    public void Read_SecondUndatedLeadActionLevel_IsRefused()
    {
        var refusal = Refused(With(p => Levels(p).Add(LeadInWater(15))), "levels[3]");
        Assert.Contains("levels[0]", refusal.Message);
    }

    [Fact]
    public void Read_DatedLevelsSharingOneDay_AreRefused()
    {
        var refusal = Refused(With(p =>
        {
            Level(p, 0)["effectiveUntil"] = "2036-01-12";
            Levels(p).Add(LeadInWater(5, from: "2036-01-12"));
        }), "levels[3]");
        Assert.Contains("2036-01-12", refusal.Message);
    }

    [Fact]
    public void Read_DatedLevelOverlappingUndatedOne_IsRefused() =>
        Refused(With(p => Levels(p).Add(LeadInWater(5, from: "2036-01-12"))), "levels[3]");

    [Fact]
    public void Read_SoilLevelsSharingALocation_AreRefused() =>
        Refused(With(p =>
        {
            var second = Level(p, 2).DeepClone().AsObject();
            second["appliesTo"] = new JsonArray("yard", "play-area");
            Levels(p).Add(second);
        }), "levels[3]");

    [Fact]
    public void Read_SoilLevelForEveryLocationBesideAPlayAreaOne_IsRefused() =>
        Refused(With(p =>
        {
            var second = Level(p, 2).DeepClone().AsObject();
            second.Remove("appliesTo");
            Levels(p).Add(second);
        }), "levels[3]");

    [Fact]
    public void Read_AdjacentDatesAndOtherSourceFlag_AreNotOverlaps()
    {
        var json = With(p =>
        {
            Level(p, 0)["effectiveUntil"] = "2036-01-11";
            Levels(p).Add(LeadInWater(5, from: "2036-01-12"));
            var otherSource = Level(p, 2).DeepClone().AsObject();
            otherSource["onlyWithOtherLeadSource"] = true;
            Levels(p).Add(otherSource);
            Levels(p).Add(LeadInWater(1, kind: "advisory"));
        });

        Assert.Equal(6, ProfileReader.Read(FileName, json).Levels.Count);
    }

    [Fact]
    public void Read_WaterProfileWithoutLeadActionLevel_IsRefused()
    {
        var refusal = Refused(With(p => Levels(p).RemoveAt(0)), "levels");
        Assert.Contains("no lead action level", refusal.Message);
    }

    [Fact]
    public void Read_AdvisoryOnlySchoolProfile_StillNeedsLeadActionLevel() =>
        Refused(With(p => Level(p, 0)["kind"] = "advisory"), "levels");

    [Theory]
    [InlineData("2030-01-01", null, "from the start to 2029-12-31")]
    [InlineData(null, "2035-12-31", "from 2036-01-01 on")]
    public void Read_LeadActionLevelNotOnEveryDate_IsRefused(string? from, string? until, string gap)
    {
        var refusal = Refused(With(p =>
        {
            if (from is not null) Level(p, 0)["effectiveFrom"] = from;
            if (until is not null) Level(p, 0)["effectiveUntil"] = until;
        }), "levels");
        Assert.Contains(gap, refusal.Message);
    }

    [Fact]
    public void Read_LeadActionLevelsWithAGapBetween_IsRefused()
    {
        var refusal = Refused(With(p =>
        {
            Level(p, 0)["effectiveUntil"] = "2036-01-10";
            Levels(p).Add(LeadInWater(5, from: "2036-01-12"));
        }), "levels");
        Assert.Contains("from 2036-01-11 to 2036-01-11", refusal.Message);
    }

    [Fact]
    public void Read_SoilOnlyProfile_NeedsNoWaterActionLevel()
    {
        var json = With(p => { Levels(p).RemoveAt(0); Levels(p).RemoveAt(0); });
        Assert.Single(ProfileReader.Read(FileName, json).Levels);
    }

    [Fact]
    public void ReadAll_SameIdInTwoFiles_NamesBothFiles()
    {
        var files = new[] { ("first.json", Valid), ("second.json", With(p => p["name"] = "Other")) };

        var refusal = Assert.Throws<ProfileException>(() => ProfileReader.ReadAll(files));

        Assert.Equal("second.json", refusal.FileName);
        Assert.Equal("id", refusal.Field);
        Assert.Contains("first.json", refusal.Message);
        Assert.Contains("second.json", refusal.Message);
    }

    [Fact]
    public void ReadAll_BrokenFile_NamesThatFile()
    {
        var files = new[] { ("good.json", Valid), ("bad.json", "{") };

        var refusal = Assert.Throws<ProfileException>(() => ProfileReader.ReadAll(files));

        Assert.Equal("bad.json", refusal.FileName);
    }
}
