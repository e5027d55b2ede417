using CommunityLead.Rules.LabResults;

namespace CommunityLead.Tests.Rules.LabResults;

public class AnalytesTests
{
    // Pb and Cu are the chemical symbols of lead and copper.
    [Theory]
    [InlineData("lead", Analyte.Lead)]
    [InlineData("Lead", Analyte.Lead)]
    [InlineData(" LEAD ", Analyte.Lead)]
    [InlineData("Pb", Analyte.Lead)]
    [InlineData("pb", Analyte.Lead)]
    [InlineData("PB", Analyte.Lead)]
    [InlineData("copper", Analyte.Copper)]
    [InlineData("Copper ", Analyte.Copper)]
    [InlineData("Cu", Analyte.Copper)]
    [InlineData("CU", Analyte.Copper)]
    public void TryParse_NameOrSymbol_IsRecognised(string text, Analyte expected)
    {
        Assert.True(Analytes.TryParse(text, out var analyte));
        Assert.Equal(expected, analyte);
    }

    [Theory]
    [InlineData(null)]
    [InlineData("")]
    [InlineData("arsenic")]
    [InlineData("P b")]
    [InlineData("lead-210")]
    public void TryParse_Other_IsFalse(string? text) => Assert.False(Analytes.TryParse(text, out _));
}
