using CommunityLead.Api.Features.Letters;
using CommunityLead.Api.Features.Letters.Composing;
using CommunityLead.Rules.Interpretation;
using static CommunityLead.Tests.Features.Letters.Composing.LetterCases;

namespace CommunityLead.Tests.Features.Letters.Composing;

/// <summary>What it means, what to do, cautions, who to call and the closing: from the interpretation and the settings.</summary>
public class LetterSectionsTests
{
    public static TheoryData<string> AllCases => [.. English.Select(c => c.Name)];

    private static LetterCase Case(string name) => English.Single(c => c.Name == name);

    [Theory]
    [MemberData(nameof(AllCases))]
    public void Compose_AnyLetter_HealthDepartmentFromSettingsAndNotMedicalAdviceClosing(string name)
    {
        var letter = Case(name).Compose();

        Assert.Contains(letter.WhoToCall.Paragraphs, p => p.Contains(Settings.HealthDepartmentName) && p.Contains(Settings.HealthDepartmentPhone));
        Assert.Contains("not medical advice", letter.Closing);
        Assert.Contains("health department", letter.Closing);
        Assert.True(letter.Steps.Numbered);
        Assert.DoesNotContain(letter.Steps.Paragraphs, p => p.Length == 0);
    }

    [Theory]
    [MemberData(nameof(AllCases))]
    public void Compose_AnyLetter_PrintsEachMessageOnceInItsSection(string name)
    {
        var @case = Case(name);
        var letter = @case.Compose();
        var printed = LetterText.Sections(letter).SelectMany(s => s.Paragraphs).Append(letter.Closing).ToList();

        Assert.Equal(printed.Count, printed.Distinct().Count());
        // With more results than scales (a sequential profile), the table alone lists the low ones: their sentences are left out.
        var manyResults = @case.Interpretation.Messages.Count(m => m.Code.StartsWith("result.")) > LeadScales.MostScales;
        string[] quiet = ["result.low", "result.not-detected", "result.measured"];
        foreach (var message in @case.Interpretation.Messages.Where(m => m.Code != MessageCatalog.Corrected.Code || letter.Kind != LetterKind.Corrected))
        {
            if (manyResults && quiet.Contains(message.Code))
            {
                Assert.DoesNotContain(message.En, letter.Meaning.Paragraphs);
                continue;
            }
            var section = message.Code.Split('.')[0] switch
            {
                "step" => letter.Steps.Paragraphs,
                "care" => letter.Cautions.Paragraphs,
                "closing" => [letter.Closing],
                _ => letter.Meaning.Paragraphs,
            };
            Assert.True(section.Contains(message.En), $"{message.Code} is not in its section");
        }
    }

    /// <summary>
    /// A guard against runaway text (a message printed twice, a section in both languages): the longest letters
    /// now run to about 450 English and 520 Spanish words of prose, which with the table and scales fill two
    /// pages. The page count itself is checked on the rendered PDF.
    /// </summary>
    [Theory]
    [MemberData(nameof(AllCases))]
    public void Compose_AnyLetterInEitherLanguage_StaysShortEnoughForTwoPages(string name)
    {
        foreach (var language in new[] { CommunityLead.Rules.Households.LetterLanguage.En, CommunityLead.Rules.Households.LetterLanguage.Es })
        {
            var words = LetterText.Paragraphs(Case(name).Compose(language)).Sum(p => p.Split(' ', StringSplitOptions.RemoveEmptyEntries).Length);
            Assert.True(words <= 650, $"{name} ({language}): {words} words of prose");
        }
    }

    [Fact]
    public void Compose_Meaning_FollowsTheInterpretationsOrder()
    {
        var @case = ServiceLine;
        var expected = @case.Interpretation.Messages.Where(m => !m.Code.StartsWith("step.") && !m.Code.StartsWith("care.") && !m.Code.StartsWith("closing."))
            .Select(m => m.En);

        var letter = @case.Compose();

        Assert.Equal(expected, letter.Meaning.Paragraphs);
        Assert.Equal("What your results mean", letter.Meaning.Heading);
        Assert.Contains(MessageCatalog.PatternFurther.En, letter.Meaning.Paragraphs);
        Assert.Contains(MessageCatalog.ServiceLineLead.En, letter.Meaning.Paragraphs);
    }

    [Fact]
    public void Compose_ActionWithChildUnder6_NamesDoctorUtilityAndUrgesBloodTest()
    {
        var letter = ActionWithChild.Compose();

        Assert.Contains(MessageCatalog.StepUseFiltered.En, letter.Steps.Paragraphs);
        Assert.Contains(MessageCatalog.BloodTestSoon.En, letter.Cautions.Paragraphs);
        Assert.Contains(letter.WhoToCall.Paragraphs, p => p.Contains("your doctor"));
        Assert.Contains(letter.WhoToCall.Paragraphs, p => p.Contains(Settings.WaterUtilityName!) && p.Contains(Settings.WaterUtilityPhone!));
        Assert.Equal(MessageCatalog.ClosingPublic.En, letter.Closing);
    }

    [Fact]
    public void Compose_NoChildOrPregnancy_NoDoctorLine()
    {
        Assert.DoesNotContain(Low.Compose().WhoToCall.Paragraphs, p => p.Contains("doctor"));
    }

    [Fact]
    public void Compose_LowResult_CautionsCarryTheUsualOnes()
    {
        var letter = Low.Compose();
        var text = LetterText.Joined(letter);

        Assert.Contains(MessageCatalog.NoSafeLevel.En, letter.Cautions.Paragraphs);
        Assert.Contains(MessageCatalog.NoBoil.En, letter.Cautions.Paragraphs);
        Assert.Contains(MessageCatalog.BloodTest.En, letter.Cautions.Paragraphs);
        Assert.Contains("cold water", text);
        Assert.Contains("aerator", text);
    }

    [Fact]
    public void Compose_PrivateWell_NoUtilityAndTheHealthDepartmentAboutTheWell()
    {
        var letter = PrivateWell.Compose();
        var text = LetterText.Joined(letter);

        Assert.DoesNotContain(Settings.WaterUtilityName!, text);
        Assert.DoesNotContain(Settings.WaterUtilityPhone!, text);
        Assert.DoesNotContain("water utility", text);
        Assert.Contains(letter.WhoToCall.Paragraphs, p => p.Contains(Settings.HealthDepartmentName) && p.Contains("well"));
        Assert.Equal(MessageCatalog.ClosingWell.En, letter.Closing);
        Assert.Contains(MessageCatalog.WellAdvice.En, letter.Meaning.Paragraphs);
    }

    [Fact]
    public void Compose_Corrected_OpensWithReplacementParagraphOnce()
    {
        var letter = Corrected.Compose();

        Assert.Equal("Corrected results for your water test", letter.Title);
        Assert.Contains("the lab has since corrected", letter.Meaning.Paragraphs[0]);
        Assert.Contains("replaces", letter.Meaning.Paragraphs[0]);
        Assert.DoesNotContain(MessageCatalog.Corrected.En, letter.Meaning.Paragraphs);
        Assert.NotNull(letter.Results);
    }

    [Fact]
    public void Compose_KindDisagreesWithTheBand_IsRefused()
    {
        Assert.Throws<ArgumentException>(() => (Retest with { Kind = LetterKind.Results }).Compose());
        Assert.Throws<ArgumentException>(() => (Low with { Kind = LetterKind.Retest }).Compose());
    }

    [Fact]
    public void Compose_LevelsOfAnotherProfileVersion_AreRefused()
    {
        var stale = LetterLevels.For(Profiles.UsLcri with { Version = 2 }, DefaultProgram, Collected);

        Assert.Throws<ArgumentException>(() => LetterComposer.Compose(Low.Interpretation, Profiles.UsLcri.Name, Ana,
            CommunityLead.Rules.Households.LetterLanguage.En, LetterKind.Results, Code, Collected, LetterDate, false, false, Settings, stale));
    }
}
