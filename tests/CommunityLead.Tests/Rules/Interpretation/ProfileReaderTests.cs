using System.Text.Json.Nodes;
using CommunityLead.Rules.Interpretation;
using CommunityLead.Rules.LabResults;
using CommunityLead.Rules.Sampling;
using static CommunityLead.Tests.Rules.Interpretation.ProfileJson;

namespace CommunityLead.Tests.Rules.Interpretation;

/// <summary>A valid file becomes the records the rules use, word for word.</summary>
public class ProfileReaderTests
{
    [Fact]
    public void Read_ValidFile_MapsEveryField()
    {
        var profile = ProfileReader.Read(FileName, With(p =>
        {
            p["notes"] = "Some notes.";
            Level(p, 0)["effectiveUntil"] = "2036-01-11";
            Levels(p).Add(LeadInWater(10, from: "2036-01-12"));
            Level(p, 2)["appliesTo"] = new JsonArray("play-area", "drip-line");
            Level(p, 2)["onlyWithOtherLeadSource"] = true;
        }));

        Assert.Equal(("test-profile", 1, "Test profile", "Nowhere", "Some notes."),
            (profile.Id, profile.Version, profile.Name, profile.Jurisdiction, profile.Notes));
        var lead = profile.Levels[0];
        Assert.Equal((Analyte.Lead, Matrix.Water, LevelKind.ActionLevel, 10.0, "\u00B5g/L"),
            (lead.Analyte, lead.Matrix, lead.Kind, lead.Value, lead.Unit));
        Assert.Equal(("Lead meaning.", "Lead source", "published"), (lead.Meaning, lead.Source, lead.Marker));
        Assert.Equal((null, new DateOnly(2036, 1, 11)), (lead.EffectiveFrom, lead.EffectiveUntil));
        Assert.Equal((new DateOnly(2036, 1, 12), null), (profile.Levels[3].EffectiveFrom, profile.Levels[3].EffectiveUntil));
        Assert.Null(lead.AppliesTo);
        Assert.False(lead.OnlyWithOtherLeadSource);
        var soil = profile.Levels[2];
        Assert.Equal([SoilLocation.PlayArea, SoilLocation.DripLine], soil.AppliesTo!);
        Assert.True(soil.OnlyWithOtherLeadSource);
        Assert.Equal(1.3, profile.Levels[1].Value);
    }

    [Fact]
    public void Read_NoNotes_LeavesNotesNull() => Assert.Null(ProfileReader.Read(FileName, Valid).Notes);

    [Fact]
    public void Read_EscapedMicroSign_IsTheSameUnit() =>
        Assert.Equal(Units.MicrogramsPerLiter, ProfileReader.Read(FileName, Valid.Replace("µg/L", "\\u00b5g/L")).Levels[0].Unit);

    [Fact]
    public void Read_EffectiveFromEqualsUntil_IsOneDay()
    {
        var profile = ProfileReader.Read(FileName, With(p =>
            Levels(p).Add(LeadInWater(1, from: "2030-06-01", until: "2030-06-01", kind: "advisory"))));
        Assert.Equal(profile.Levels[3].EffectiveFrom, profile.Levels[3].EffectiveUntil);
    }
}
