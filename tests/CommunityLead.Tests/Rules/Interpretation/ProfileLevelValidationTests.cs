using System.Text.Json.Nodes;
using static CommunityLead.Tests.Rules.Interpretation.ProfileJson;

namespace CommunityLead.Tests.Rules.Interpretation;

/// <summary>One level at a time: every field of levels[i] and what fits together within one level.</summary>
public class ProfileLevelValidationTests
{
    [Theory]
    [InlineData("analyte")]
    [InlineData("matrix")]
    [InlineData("kind")]
    [InlineData("value")]
    [InlineData("unit")]
    [InlineData("meaning")]
    [InlineData("source")]
    [InlineData("marker")]
    public void Read_LevelFieldMissing_IsNamed(string field) =>
        Refused(With(p => Level(p, 1).Remove(field)), $"levels[1].{field}");

    [Theory]
    [InlineData("meaning")]
    [InlineData("source")]
    [InlineData("unit")]
    public void Read_LevelTextEmpty_IsNamed(string field)
    {
        var refusal = Refused(With(p => Level(p, 1)[field] = "  "), $"levels[1].{field}");
        Assert.EndsWith("is empty", refusal.Message);
    }

    [Theory]
    [InlineData("analyte", "arsenic", "lead, copper")]
    [InlineData("analyte", "Lead", "lead, copper")]
    [InlineData("analyte", "pb", "lead, copper")]
    [InlineData("matrix", "air", "water, soil")]
    [InlineData("kind", "mcl", "action-level, advisory, aesthetic, soil-level")]
    [InlineData("kind", "ActionLevel", "action-level, advisory, aesthetic, soil-level")]
    public void Read_UnknownChoice_ListsTheAllowedOnes(string field, string text, string allowed)
    {
        var refusal = Refused(With(p => Level(p, 0)[field] = text), $"levels[0].{field}");
        Assert.Contains(allowed, refusal.Message);
    }

    [Theory]
    [InlineData("0")]
    [InlineData("-5")]
    [InlineData("-0.0")]
    [InlineData("1e400")]
    [InlineData("-1e400")]
    [InlineData("\"10\"")]
    [InlineData("null")]
    public void Read_ValueNotFiniteAndPositive_IsRefused(string value) =>
        Refused(Valid.Replace("\"value\": 10,", $"\"value\": {value},"), "levels[0].value");

    [Theory]
    [InlineData(0, "ug/L")]
    [InlineData(0, "\u03BCg/L")] // Greek mu, as copied from PDFs: looks right, is not U+00B5
    [InlineData(0, "ppb")]
    [InlineData(0, "mg/L")]
    [InlineData(0, "µg/l")]
    [InlineData(1, "µg/L")]
    [InlineData(1, "ppm")]
    [InlineData(2, "ppm")]
    [InlineData(2, "mg/L")]
    public void Read_UnitNotTheNormalUnit_IsRefused(int index, string unit)
    {
        var refusal = Refused(With(p => Level(p, index)["unit"] = unit), $"levels[{index}].unit");
        Assert.Contains("write exactly", refusal.Message);
    }

    [Theory]
    [InlineData("Published")]
    [InlineData("guess")]
    [InlineData("practise")]
    public void Read_UnknownMarker_IsRefused(string marker)
    {
        var refusal = Refused(With(p => Level(p, 0)["marker"] = marker), "levels[0].marker");
        Assert.Contains("published, memory, practice", refusal.Message);
    }

    [Fact]
    public void Read_AppliesToOnWater_IsRefused() =>
        Refused(With(p => Level(p, 0)["appliesTo"] = new JsonArray("play-area")), "levels[0].appliesTo");

    [Fact]
    public void Read_OtherLeadSourceOnWater_IsRefused() =>
        Refused(With(p => Level(p, 0)["onlyWithOtherLeadSource"] = false), "levels[0].onlyWithOtherLeadSource");

    [Fact]
    public void Read_AppliesToEmpty_IsRefused() =>
        Refused(With(p => Level(p, 2)["appliesTo"] = new JsonArray()), "levels[2].appliesTo");

    [Fact]
    public void Read_AppliesToUnknownLocation_IsRefused()
    {
        var refusal = Refused(With(p => Level(p, 2)["appliesTo"] = new JsonArray("yard", "porch")), "levels[2].appliesTo[1]");
        Assert.Contains("play-area, garden, drip-line, yard", refusal.Message);
    }

    [Fact]
    public void Read_AppliesToTwice_IsRefused() =>
        Refused(With(p => Level(p, 2)["appliesTo"] = new JsonArray("yard", "yard")), "levels[2].appliesTo[1]");

    [Fact]
    public void Read_SoilLevelOnWater_IsRefused() =>
        Refused(With(p => Level(p, 0)["kind"] = "soil-level"), "levels[0].kind");

    [Theory]
    [InlineData("action-level")]
    [InlineData("aesthetic")]
    public void Read_WaterKindOnSoil_IsRefused(string kind) =>
        Refused(With(p => Level(p, 2)["kind"] = kind), "levels[2].kind");

    [Fact]
    public void Read_EffectiveFromAfterUntil_IsRefused()
    {
        var refusal = Refused(
            With(p => Levels(p).Add(LeadInWater(5, from: "2036-01-12", until: "2036-01-11", kind: "advisory"))),
            "levels[3].effectiveFrom");
        Assert.Contains("2036-01-12 is after effectiveUntil 2036-01-11", refusal.Message);
    }

    [Theory]
    [InlineData("12/01/2036")]
    [InlineData("2036-1-12")]
    [InlineData("2036-01-12T00:00:00Z")]
    [InlineData("2036-02-30")]
    public void Read_DateNotIso_IsRefused(string date) =>
        Refused(With(p => Level(p, 0)["effectiveUntil"] = date), "levels[0].effectiveUntil");

    [Fact]
    public void Read_MisspeltLevelField_IsRefused() =>
        Refused(With(p => Level(p, 0)["efectiveFrom"] = "2036-01-12"), "levels[0].efectiveFrom");
}
