using CommunityLead.Rules.Interpretation;
using CommunityLead.Rules.LabResults;
using static CommunityLead.Tests.Rules.Interpretation.ProfileFiles;

namespace CommunityLead.Tests.Rules.Interpretation;

/// <summary>Every shipped profile is valid, named after its id, and the set is the one issue 4 asks for.</summary>
public class ProfileShippedTests
{
    [Fact]
    public void Shipped_AllFiles_PassValidationTogether()
    {
        var profiles = ProfileReader.ReadAll(All());

        Assert.Equal(
            ["epa-soil-screening-2024", "eu-2020-2184", "health-canada", "schools-child-care",
             "us-lcr", "us-lcri", "us-soil-hazard", "who"],
            profiles.Select(p => p.Id));
    }

    [Fact]
    public void Shipped_EachProfile_HasASpanishName()
    {
        // Letters go out in English and Spanish; without "nameEs" a Spanish letter would print the English name.
        Assert.All(ProfileReader.ReadAll(All()), p =>
        {
            Assert.False(string.IsNullOrWhiteSpace(p.SpanishName), p.Id);
            Assert.NotEqual(p.Name, p.SpanishName);
            Assert.Equal(p.SpanishName, p.NameIn(spanish: true));
            Assert.Equal(p.Name, p.NameIn(spanish: false));
        });
    }

    [Fact]
    public void Shipped_EachFile_IsNamedAfterItsIdAtItsVersion()
    {
        // A changed shipped profile raises its version (DEVELOPERS.md): us-soil-hazard v2 added the EPA screening levels.
        var raised = new Dictionary<string, int> { ["us-soil-hazard"] = 2 };
        foreach (var (fileName, json) in All())
        {
            var profile = ProfileReader.Read(fileName, json);
            Assert.Equal($"{profile.Id}.json", fileName);
            Assert.Equal(raised.GetValueOrDefault(profile.Id, 1), profile.Version);
        }
    }

    [Fact]
    public void Shipped_EveryLevel_HasUnitMeaningSourceAndMarker()
    {
        foreach (var level in ProfileReader.ReadAll(All()).SelectMany(p => p.Levels))
        {
            Assert.Equal(Analytes.NormalUnit(level.Analyte, level.Matrix), level.Unit);
            Assert.False(string.IsNullOrWhiteSpace(level.Meaning));
            Assert.False(string.IsNullOrWhiteSpace(level.Source));
            Assert.Contains(level.Marker, new[] { "published", "memory", "practice" });
        }
    }

    [Fact]
    public void Shipped_Meanings_AreOneSentenceEach()
    {
        foreach (var level in ProfileReader.ReadAll(All()).SelectMany(p => p.Levels))
        {
            Assert.EndsWith(".", level.Meaning);
            Assert.DoesNotContain(". ", level.Meaning);
        }
    }
}
