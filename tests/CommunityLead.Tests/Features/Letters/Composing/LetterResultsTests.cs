using CommunityLead.Api.Features.Letters;
using CommunityLead.Rules.Interpretation;
using static CommunityLead.Tests.Features.Letters.Composing.LetterCases;

namespace CommunityLead.Tests.Features.Letters.Composing;

/// <summary>The results table and the kit facts: values with units, censored results in words, the level and the profile named.</summary>
public class LetterResultsTests
{
    private const string ActionLevel = "Action level 10 µg/L";

    [Fact]
    public void Compose_LowResult_TableHasValuesUnitsAndNotDetected()
    {
        var letter = Low.Compose();

        var table = Assert.IsType<ResultTable>(letter.Results);
        Assert.Equal(["Sample", "Test", "Result", "Compared with"], table.Headers);
        Assert.Equal<IEnumerable<string>>(
        [
            ["First water from the tap (first draw)", "Lead", "2.1 µg/L", ActionLevel],
            // Copper below everything: compared with its action level, 1.3 mg/L (40 CFR 141.80(c)), as its sentence says.
            ["First water from the tap (first draw)", "Copper", "0.12 mg/L", "Action level 1.3 mg/L"],
            ["After running the tap (flushed)", "Lead", "Not detected (below 1 µg/L)", ActionLevel],
        ], table.Rows);
        Assert.Contains("US federal, Lead and Copper Rule Improvements", table.Note);
    }

    [Fact]
    public void Compose_LowResult_KitFactsAndDatesWrittenOut()
    {
        var letter = Low.Compose();

        Assert.Equal("April 3, 2026", letter.Date);
        Assert.Equal([new("Kit code", Code), new LabeledValue("Date collected", "April 2, 2026")], letter.KitFacts);
        Assert.Equal(["Ana Quill", "41 Heron Lane", "Apt 2", "Brindle Cove, TC 00002"], letter.Recipient);
        Assert.Equal("Brindle Cove Tap Check", letter.Program.Name);
        Assert.Contains("Phone: +1 555 0100", letter.Program.ContactLines);
        Assert.Equal("Your water test results", letter.Title);
        Assert.Equal($"Brindle Cove Tap Check · Kit code {Code}", letter.Footer);
    }

    [Fact]
    public void Compose_LowResult_OneScalePerLeadResult()
    {
        var scales = Low.Compose().Scales;

        Assert.Equal(["First water from the tap (first draw)", "After running the tap (flushed)"], scales.Select(s => s.Label));
        Assert.Equal(["2.1 µg/L", "not detected"], scales.Select(s => s.ValueText));
        Assert.All(scales, s =>
        {
            Assert.Equal([new ScaleMark(10, "Action level")], s.Levels);
            Assert.Equal(15, s.Maximum);
            Assert.Equal("µg/L", s.Unit);
        });
    }

    [Fact]
    public void Compose_ActionLevel_TableAndScaleShowTheResultAgainstTheActionLevel()
    {
        var letter = ActionWithChild.Compose();

        Assert.Equal(["First water from the tap (first draw)", "Lead", "12.4 µg/L", ActionLevel], letter.Results!.Rows[0]);
        var scale = letter.Scales[0];
        Assert.Equal((12.4, "12.4 µg/L", 20.0), (scale.Value, scale.ValueText, scale.Maximum));
        Assert.Equal([new ScaleMark(10, "Action level")], scale.Levels);
    }

    [Fact]
    public void Compose_SequentialNearUrgent_EveryBarShowsTheUrgentLevelOnOneAxis()
    {
        var scales = Sequential.Compose().Scales;

        Assert.Equal(["Sequential bottle 1", "Sequential bottle 2", "Sequential bottle 3"], scales.Select(s => s.Label));
        // 40 µg/L is near the program's 50 µg/L urgent level: shown on every bar, so the bars read alike, and the
        // one axis runs past it (1.5 × 50 → 80), drawn to size (50 is well past the first quarter of 80).
        Assert.All(scales, s =>
        {
            Assert.Equal([new ScaleMark(10, "Action level"), new ScaleMark(50, "Urgent level")], s.Levels);
            Assert.Equal((80.0, (double?)null), (s.Maximum, s.BreakAt));
        });
    }

    [Fact]
    public void Compose_SoilWithUncertainty_RowsSayNotSureBelowAndNotDetected()
    {
        var letter = SoilUncertain.Compose();

        Assert.Equal("Your soil test results", letter.Title);
        Assert.Contains(new LabeledValue("Test", "Soil test"), letter.KitFacts);
        Assert.Equal<IEnumerable<string>>(
        [
            ["Play area soil", "Lead", "380 mg/kg", "Not sure: close to the level of 400 mg/kg"],
            ["Garden soil", "Lead", "150 mg/kg", "Below the level of 1,200 mg/kg"],
            ["Soil under the roof edge", "Lead", "Not detected (below 20 mg/kg)", "Below the level of 1,200 mg/kg"],
        ], letter.Results!.Rows);
        Assert.Contains("US federal soil-lead hazard standards", letter.Results.Note);
        Assert.Equal([400.0, 1200, 1200], letter.Scales.Select(s => s.Levels.Single().Value));
        // One soil axis for the letter, to 1.5 × 1,200 → 2,000, so 380 in the play area never looks larger than 150 in the garden.
        Assert.Equal([2000.0, 2000, 2000], letter.Scales.Select(s => s.Maximum));
        Assert.Contains(letter.Meaning.Paragraphs, p => p.Contains("give or take 60 mg/kg"));
    }

    [Fact]
    public void Compose_Retest_ListsWhatWentWrongAndNoNumbers()
    {
        var letter = Retest.Compose();

        Assert.Equal(LetterKind.Retest, letter.Kind);
        Assert.Equal("Please test your water again", letter.Title);
        Assert.Null(letter.Results);
        Assert.Empty(letter.Scales);
        Assert.Equal("Why we ask you to test again", letter.Meaning.Heading);
        Assert.Contains(MessageCatalog.RetestStandingShort.En, letter.Meaning.Paragraphs);
        Assert.Contains(MessageCatalog.StepRetestWater.En, letter.Steps.Paragraphs);
        Assert.DoesNotContain("µg/L", LetterText.Joined(letter));
    }

    [Theory]
    [InlineData(0.9, 1)]
    [InlineData(15, 15)]
    [InlineData(18.6, 20)]
    [InlineData(75, 80)]
    [InlineData(217.5, 250)]
    [InlineData(1800, 2000)]
    public void RoundUp_ScaleMaximum_IsTheNextRoundNumber(double value, double expected) =>
        Assert.Equal(expected, CommunityLead.Api.Features.Letters.Composing.LeadScales.RoundUp(value));
}
