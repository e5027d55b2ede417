using CommunityLead.Api.Features.Letters.Composing;
using CommunityLead.Rules.Households;
using CommunityLead.Rules.Reading;
using static CommunityLead.Tests.Features.Letters.Composing.LetterCases;

namespace CommunityLead.Tests.Features.Letters.Composing;

/// <summary>
/// The scales' axes: one per matrix in a letter, so bars compare at a glance, and broken past the levels when a
/// result is far above them, with one plain line saying so.
/// </summary>
public class LetterScaleAxisTests
{
    [Theory]
    [InlineData(LetterLanguage.En)]
    [InlineData(LetterLanguage.Es)]
    public void Compose_WaterBarsOfOneLetter_ShareOneAxisAndTheSameLevels(LetterLanguage language)
    {
        foreach (var @case in new[] { Low, ActionWithChild, Urgent, VeryHigh, Sequential, SequentialFive })
        {
            var scales = @case.Compose(language).Scales;

            Assert.True(scales.Count >= 2, @case.Name);
            Assert.Single(scales.Select(s => (s.Maximum, s.BreakAt, s.Unit)).Distinct());
            Assert.All(scales, s => Assert.Equal(scales[0].Levels, s.Levels));
        }
    }

    [Fact]
    public void Compose_SoilBars_ShareTheirOwnAxisEachWithItsOwnLevel()
    {
        var scales = SoilNearLevel.Compose().Scales;

        // Play area 120 against 400, drip line 940 against the rest-of-yard 1,200 level (40 CFR 745.65): one axis to
        // 1.5 × 1,200 → 2,000, to size, so 940 shows just short of its level.
        Assert.Equal([(2000.0, (double?)null)], scales.Select(s => (s.Maximum, s.BreakAt)).Distinct());
        Assert.Equal([(120.0, 400.0), (940, 1200)], scales.Select(s => (s.Value, s.Levels.Single().Value)));
        Assert.Null(SoilNearLevel.Compose().ScaleNote);
    }

    [Fact]
    public void Compose_SoilJudgedOnTheScreeningLevel_BarShowsTheHazardStandardToo()
    {
        var scales = SoilDripLine.Compose().Scales;

        // EPA 2024 residential screening level 200 mg/kg (Updated Residential Soil Lead Guidance) beside the hazard
        // standards of 40 CFR 745.65: 400 in a play area, 1,200 elsewhere in the yard. 940 under the roof edge is above
        // the first and below the second, and the bar must show both, so it reads as neither safe nor a hazard.
        Assert.Equal([(150.0, new[] { 200.0, 400 }), (940, new[] { 200.0, 1200 })],
            scales.Select(s => (s.Value, s.Levels.Select(l => l.Value).ToArray())));
        Assert.All(scales, s => Assert.Equal(["EPA screening level", "Federal hazard level"], s.Levels.Select(l => l.Label)));
    }

    [Fact]
    public void Compose_ResultFarAboveEveryLevel_AxisBreaksPastTheLevels()
    {
        var letter = VeryHigh.Compose();

        // 2,000 µg/L against 10 and 50: to size to 3,000 would put the urgent level at 1.7 % of the bar. Broken at
        // the round number past 1.5 × 50, squeezed after it up to 1.5 × 2,000.
        Assert.All(letter.Scales, s => Assert.Equal((3000.0, (double?)80), (s.Maximum, s.BreakAt)));
        Assert.All(letter.Scales, s => Assert.True(s.Levels.Max(l => l.Value) < s.BreakAt));
        Assert.Equal("A bar with // is cut there so a very high result fits. After the cut, the bar is not drawn to size.", letter.ScaleNote);
        Assert.Equal("Una barra con // está cortada ahí para que quepa un resultado muy alto. Después del corte, la barra no está a escala.",
            VeryHigh.Compose(LetterLanguage.Es).ScaleNote);
    }

    [Theory]
    [InlineData(75, 150)]
    [InlineData(40, 80)]
    public void Compose_UrgentResult_AxisDrawnToSizeWithoutANote(double firstDraw, double end)
    {
        var @case = Urgent with
        {
            Kit = Urgent.Kit with { Results = [.. Urgent.Kit.Results.Select((r, i) => i == 0 ? r with { Value = firstDraw } : r)] },
        };

        var letter = @case.Compose();

        Assert.All(letter.Scales, s => Assert.Equal((end, (double?)null), (s.Maximum, s.BreakAt)));
        Assert.Null(letter.ScaleNote);
    }

    [Theory]
    // Highest level, highest value → end and break. The levels stay to size while they reach a quarter of the bar.
    [InlineData(10, 2.1, 15, null)]
    [InlineData(50, 200, 300, 80.0)]
    [InlineData(10, 60, 100, 15.0)]
    [InlineData(10, 25, 40, null)]
    [InlineData(1200, 5000, 8000, 2000.0)]
    [InlineData(0, 30, 50, null)]
    public void Axis_HighestLevelAndValue_EndAndBreak(double level, double value, double end, double? breakAt)
    {
        var finding = new CommunityLead.Rules.Interpretation.Finding(CommunityLead.Rules.Sampling.BottleType.FirstDraw, null, null,
            CommunityLead.Rules.LabResults.Analyte.Lead, value, "µg/L", false, CommunityLead.Rules.Interpretation.Band.Low, null, null);

        Assert.Equal((end, breakAt), LeadScales.Axis([finding], level > 0 ? [level] : []));
    }

    [Fact]
    public void Compose_ScaleNote_PlainEnglishAtGradeEightOrBelow()
    {
        var note = VeryHigh.Compose().ScaleNote!;

        // EPA asks for no more than 7th–8th grade reading level (DOMAIN.md §7).
        Assert.True(Readability.FleschKincaidGrade(note) <= 8, $"{Readability.FleschKincaidGrade(note):0.0}: {note}");
    }
}
