using System.Text.Json.Nodes;
using CommunityLead.Rules.Interpretation;
using static CommunityLead.Tests.Rules.Interpretation.ProfileJson;

namespace CommunityLead.Tests.Rules.Interpretation;

/// <summary>The profile as a whole: JSON that does not parse, and the fields above the levels.</summary>
public class ProfileValidationTests
{
    [Theory]
    [InlineData("", "line 1, column 1")]
    [InlineData("{\n  \"id\": \"x\",\n  \"name\" \"y\"\n}", "line 3, column 10")]
    [InlineData("{\n  \"unit\": \"µg/L\" x\n}", "line 2, column 18")]
    [InlineData("{\n  \"id\": \"x\",\n}", "line 3, column 1")]
    [InlineData("{\n  \"id\": \"x\",\n", "line 3, column 1")]
    public void Read_MalformedJson_SaysWhere(string json, string where)
    {
        var refusal = Refused(json, "$");
        Assert.Contains($"not valid JSON at {where}", refusal.Message);
    }

    [Theory]
    [InlineData("[]")]
    [InlineData("\"us-lcri\"")]
    [InlineData("null")]
    public void Read_NotAnObject_IsRefused(string json) => Refused(json, "$");

    [Fact]
    public void Read_ByteOrderMark_IsAccepted() =>
        Assert.Equal("test-profile", ProfileReader.Read(FileName, "\uFEFF" + Valid).Id);

    [Theory]
    [InlineData("id")]
    [InlineData("name")]
    [InlineData("jurisdiction")]
    [InlineData("version")]
    [InlineData("levels")]
    public void Read_MissingField_IsNamed(string field)
    {
        var refusal = Refused(With(p => p.Remove(field)), field);
        Assert.EndsWith("is missing", refusal.Message);
    }

    [Theory]
    [InlineData("id", "")]
    [InlineData("name", " ")]
    [InlineData("jurisdiction", "\t")]
    public void Read_EmptyText_IsNamed(string field, string empty)
    {
        var refusal = Refused(With(p => p[field] = empty), field);
        Assert.EndsWith("is empty", refusal.Message);
    }

    [Fact]
    public void Read_NullId_CountsAsMissing() => Refused(With(p => p["id"] = null), "id");

    [Theory]
    [InlineData("US-LCRI")]
    [InlineData("us_lcri")]
    [InlineData("us lcri")]
    [InlineData("us-lcri.json")]
    [InlineData("us-lcri\n")]
    [InlineData("é")]
    public void Read_IdOutsidePattern_IsRefused(string id)
    {
        var refusal = Refused(With(p => p["id"] = id), "id");
        Assert.Contains("lower-case letters, digits and hyphens", refusal.Message);
    }

    [Fact]
    public void Read_IdLongerThanItsColumn_IsRefused()
    {
        // Every interpretation and letter stores the profile id in a column of this length.
        var longest = new string('a', ProfileReader.IdMaxLength);
        Assert.Equal(longest, ProfileReader.Read(FileName, With(p => p["id"] = longest)).Id);

        var refusal = Refused(With(p => p["id"] = longest + "a"), "id");
        Assert.Contains($"at most {ProfileReader.IdMaxLength}", refusal.Message);
    }

    [Theory]
    [InlineData(0)]
    [InlineData(-1)]
    public void Read_VersionBelow1_IsRefused(int version) => Refused(With(p => p["version"] = version), "version");

    [Theory]
    [InlineData("1.5")]
    [InlineData("\"1\"")]
    [InlineData("true")]
    public void Read_VersionNotWholeNumber_IsRefused(string version) =>
        Refused(With(p => p["version"] = JsonNode.Parse(version)), "version");

    [Fact]
    public void Read_NoLevels_IsRefused()
    {
        var refusal = Refused(With(p => p["levels"] = new JsonArray()), "levels");
        Assert.Contains("at least one level", refusal.Message);
    }

    [Fact]
    public void Read_LevelsNotAList_IsRefused() => Refused(With(p => p["levels"] = new JsonObject()), "levels");

    [Fact]
    public void Read_LevelNotAnObject_IsRefused() => Refused(With(p => Levels(p)[1] = 10), "levels[1]");

    [Fact]
    public void Read_UnknownField_IsRefused()
    {
        var refusal = Refused(With(p => p["jurisdction"] = "typo"), "jurisdction");
        Assert.Contains("jurisdiction", refusal.Message);
    }

    [Fact]
    public void Read_FieldTwice_IsRefused() =>
        Refused(Valid.Replace("\"id\": \"test-profile\",", "\"id\": \"test-profile\", \"id\": \"other\","), "id");

    [Fact]
    public void Read_NotesNotText_IsRefused() => Refused(With(p => p["notes"] = 5), "notes");
}
