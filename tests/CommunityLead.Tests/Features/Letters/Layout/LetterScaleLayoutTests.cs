using CommunityLead.Rules.Households;
using CommunityLead.Tests.Features.Letters.Composing;

namespace CommunityLead.Tests.Features.Letters.Layout;

/// <summary>The scales as printed, read back with PdfPig: no label on another or on a tick, and one axis for all water bars.</summary>
public class LetterScaleLayoutTests
{
    public static TheoryData<string, LetterLanguage> Sweep()
    {
        var data = new TheoryData<string, LetterLanguage>();
        foreach (var @case in ScaleSweep.Cases)
            foreach (var language in new[] { LetterLanguage.En, LetterLanguage.Es })
                data.Add(@case.Name, language);
        return data;
    }

    static RenderedLetter Render(LetterCase @case, LetterLanguage language) => RenderedLetter.Of(@case.Compose(language));

    [Theory]
    [MemberData(nameof(Sweep))]
    public void Render_SweepOfValuesAndLevels_NoWordOverlapsAnotherOrCrossesATickOrShape(string name, LetterLanguage language)
    {
        var letter = Render(ScaleSweep.Cases.Single(c => c.Name == name), language);

        var problems = Enumerable.Range(0, letter.PageWords.Count)
            .SelectMany(page => PageChecks.OverlappingWords(letter, page).Concat(PageChecks.WordsCrossingDrawings(letter, page))).ToList();
        Assert.True(problems.Count == 0, string.Join("\n", problems));
    }

    [Theory]
    [InlineData("2,000 against 10 and 50")]
    [InlineData("near urgent")]
    [InlineData("zero")]
    public void Render_WaterBars_TicksAndEndsLineUpAndALargerValueSitsFurtherRight(string name)
    {
        var @case = ScaleSweep.Cases.Single(c => c.Name == name);
        var letter = Render(@case, LetterLanguage.En);
        var bars = Bars(letter);

        Assert.Equal(2, bars.Count);
        Assert.Equal(bars[0].Left, bars[1].Left, 0.01);
        Assert.Equal(bars[0].Right, bars[1].Right, 0.01);
        Assert.Equal(bars[0].Ticks, bars[1].Ticks, new ToleranceComparer());
        // The first draw is the larger value in every one of these cases (the flushed bottle had 3.2 µg/L), or equal.
        var values = @case.Interpretation.Findings.Select(f => f.Value).ToList();
        Assert.Equal(values[0].CompareTo(values[1]), Math.Sign(Math.Round(bars[0].Marker - bars[1].Marker, 2)));
    }

    [Fact]
    public void Render_ResultFarAboveTheLevels_LevelsKeepTheirRoomAndTheNoteIsPrinted()
    {
        var content = LetterCases.VeryHigh.Compose();
        var letter = RenderedLetter.Of(content);
        var bar = Bars(letter)[0];

        // Drawn to size to 3,000, the urgent level 50 would sit 1.7 % along the bar; broken at 80 it sits at half.
        var urgent = bar.Ticks.Max();
        Assert.InRange((urgent - bar.Left) / (bar.Right - bar.Left), 0.45, 0.55);
        Assert.True(letter.Says(content.ScaleNote!));
        Assert.Contains("80", letter.Text);
        Assert.Contains("3,000 µg/L", letter.Text);
    }

    [Fact]
    public void Render_SoilNearItsLevel_ValueAndTickApartOnTheSameAxisAsThePlayArea()
    {
        var letter = RenderedLetter.Of(LetterCases.SoilNearLevel.Compose());
        var bars = Bars(letter);

        Assert.Equal(2, bars.Count);
        Assert.Equal((bars[0].Left, bars[0].Right), (bars[1].Left, bars[1].Right));
        // The play area first, then the drip line: 940 and 1,200 on 0–2,000, the marker 13 % of the bar short of the
        // tick, with "940 mg/kg" clear of both.
        Assert.Equal(0.13, (bars[1].Ticks.Single() - bars[1].Marker) / (bars[1].Right - bars[1].Left), 0.005);
        Assert.Empty(PageChecks.WordsCrossingDrawings(letter, 0));
    }

    /// <summary>
    /// Each scale's bar read from the drawing: its outline (the widest rectangles' outer edges), the ticks (1 pt
    /// vertical strokes) and the marker (the 2 pt stroke), found around each marker, in the order they are drawn.
    /// </summary>
    static List<(double Left, double Right, List<double> Ticks, double Marker)> Bars(RenderedLetter letter)
    {
        var lines = letter.PageLines[0];
        var markers = lines.Where(l => l.IsVertical && Math.Abs(l.Width - 2) < 0.01).ToList();
        return [.. markers.Select(marker =>
        {
            var (low, high) = (Math.Min(marker.From.Y, marker.To.Y), Math.Max(marker.From.Y, marker.To.Y));
            var outline = lines.Where(l => l.IsHorizontal && l.From.Y >= low - 0.01 && l.From.Y <= high + 0.01).ToList();
            var ticks = lines.Where(l => l.IsVertical && Math.Abs(l.Width - 1) < 0.01 && Math.Max(l.From.Y, l.To.Y) >= high - 0.01
                && Math.Min(l.From.Y, l.To.Y) < low).Select(l => l.From.X).Order().ToList();
            return (outline.Min(l => Math.Min(l.From.X, l.To.X)), outline.Max(l => Math.Max(l.From.X, l.To.X)), ticks, marker.From.X);
        })];
    }

    sealed class ToleranceComparer : IEqualityComparer<double>
    {
        public bool Equals(double a, double b) => Math.Abs(a - b) < 0.01;
        public int GetHashCode(double value) => 0;
    }
}
