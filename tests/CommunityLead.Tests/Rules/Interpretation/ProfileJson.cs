using System.Text.Json.Nodes;
using CommunityLead.Rules.Interpretation;

namespace CommunityLead.Tests.Rules.Interpretation;

/// <summary>A small valid profile (lead and copper in water, lead in play-area soil) and ways to break it.</summary>
internal static class ProfileJson
{
    public const string FileName = "broken.json";

    public const string Valid = """
        {
          "id": "test-profile",
          "version": 1,
          "name": "Test profile",
          "jurisdiction": "Nowhere",
          "levels": [
            { "analyte": "lead", "matrix": "water", "kind": "action-level", "value": 10, "unit": "µg/L",
              "meaning": "Lead meaning.", "source": "Lead source", "marker": "published" },
            { "analyte": "copper", "matrix": "water", "kind": "action-level", "value": 1.3, "unit": "mg/L",
              "meaning": "Copper meaning.", "source": "Copper source", "marker": "published" },
            { "analyte": "lead", "matrix": "soil", "kind": "soil-level", "value": 400, "unit": "mg/kg",
              "meaning": "Soil meaning.", "source": "Soil source", "marker": "published", "appliesTo": ["play-area"] }
          ]
        }
        """;

    public static string With(Action<JsonObject> change)
    {
        var profile = JsonNode.Parse(Valid)!.AsObject();
        change(profile);
        return profile.ToJsonString();
    }

    public static JsonObject Level(JsonObject profile, int index) => profile["levels"]![index]!.AsObject();

    public static JsonArray Levels(JsonObject profile) => profile["levels"]!.AsArray();

    public static JsonObject LeadInWater(double value, string? from = null, string? until = null, string kind = "action-level")
    {
        var level = JsonNode.Parse("""
            { "analyte": "lead", "matrix": "water", "value": 0, "unit": "µg/L",
              "meaning": "Added meaning.", "source": "Added source", "marker": "published" }
            """)!.AsObject();
        level["kind"] = kind;
        level["value"] = value;
        if (from is not null) level["effectiveFrom"] = from;
        if (until is not null) level["effectiveUntil"] = until;
        return level;
    }

    /// <summary>Reads the text and expects a refusal naming this file and the given field.</summary>
    public static ProfileException Refused(string json, string field)
    {
        var refusal = Assert.Throws<ProfileException>(() => ProfileReader.Read(FileName, json));
        Assert.Equal(FileName, refusal.FileName);
        Assert.Equal(field, refusal.Field);
        Assert.Contains(FileName, refusal.Message);
        Assert.Contains(field, refusal.Message);
        return refusal;
    }
}
