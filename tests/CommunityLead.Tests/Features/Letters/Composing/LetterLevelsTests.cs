using CommunityLead.Api.Features.Letters;
using CommunityLead.Api.Features.Letters.Composing;
using CommunityLead.Rules.Households;
using CommunityLead.Rules.Interpretation;
using CommunityLead.Rules.Kits;
using CommunityLead.Rules.LabResults;
using CommunityLead.Rules.Sampling;
using static CommunityLead.Tests.Features.Letters.Composing.LetterCases;

namespace CommunityLead.Tests.Features.Letters.Composing;

/// <summary>Levels named by their kind: exactly from the profile, or — without it — never named wrongly.</summary>
public class LetterLevelsTests
{
    // A school profile: the AAP 1 ppb advisory under the 10 µg/L action level (sources in Profiles).
    private static readonly LetterCase School = new("school, not detected", new KitFacts(KitKind.Water, Collected,
        new HouseholdContext(false, false, WaterSource.Public, ServiceLineMaterial.Copper, 1995, false),
        [new BottleResult(BottleType.FirstDraw, null, null, 1000, Analyte.Lead, 1, true, 1)], []), Profiles.Schools);

    [Fact]
    public void For_SchoolsProfile_CautionActionAndProgramUrgent()
    {
        var levels = LetterLevels.For(Profiles.Schools, DefaultProgram, Collected);

        Assert.Equal(new WaterLevels(Caution: 1, Action: 10, Urgent: 50), levels.Lead);
    }

    [Fact]
    public void For_ProgramAdvisoryStricterThanProfile_IsTheCautionLevel()
    {
        var levels = LetterLevels.For(Profiles.UsLcri, new ProgramRules(AdvisoryLeadUgL: 5), Collected);

        Assert.Equal(5, levels.Lead.Caution);
        Assert.Equal(new WaterLevels(Taste: 1.0, Action: 1.3), levels.Copper);
    }

    [Fact]
    public void Compose_SchoolsProfile_NamesTheCautionLevelAndDrawsBoth()
    {
        var letter = School.Compose();

        Assert.Equal("Caution level 1 µg/L", letter.Results!.Rows[0][3]);
        Assert.Equal([new ScaleMark(1, "Caution level"), new ScaleMark(10, "Action level")], letter.Scales[0].Levels);
    }

    [Fact]
    public void Compose_WithoutLevels_NamesTheCautionLevelABlindResultWasJudgedAgainst()
    {
        var letter = LetterComposer.Compose(School.Interpretation, Profiles.Schools.Name, Ana, LetterLanguage.En, LetterKind.Results,
            Code, Collected, LetterDate, false, false, Settings);

        // "< 2 µg/L" cannot show water is under the 1 ppb school level (AAP 2016): judged in the caution band against it.
        Assert.Equal("Caution level 1 µg/L", letter.Results!.Rows[0][3]);
        Assert.Equal([new ScaleMark(1, "Caution level")], letter.Scales[0].Levels);
    }

    [Fact]
    public void Compose_WithoutLevels_NamesTheLevelsFindingsReached()
    {
        var letter = LetterComposer.Compose(ActionWithChild.Interpretation, Profiles.UsLcri.Name, Ana, LetterLanguage.En, LetterKind.Results,
            Code, Collected, LetterDate, false, true, Settings);

        Assert.Equal("Action level 10 µg/L", letter.Results!.Rows[0][3]);
        Assert.Equal([new ScaleMark(10, "Action level")], letter.Scales[1].Levels);
    }
}
