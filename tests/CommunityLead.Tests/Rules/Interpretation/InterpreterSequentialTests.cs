using CommunityLead.Rules.Interpretation;
using static CommunityLead.Tests.Rules.Interpretation.Kit;

namespace CommunityLead.Tests.Rules.Interpretation;

public class InterpreterSequentialTests
{
    // Pipe volume per meter = π·(d/2)²: 19 mm (¾ in) inner diameter holds about 0.29 L/m (DOMAIN.md §3, practice);
    // exactly π·0.0095² m² = 0.28353 L/m.
    [Fact]
    public void Peak_OneLiterBefore_19mm_FillsAbout3Point5Metres()
    {
        var peak = Interpret(Sequential(Home(), Seq(1, 2), Seq(2, 12))).Peak;
        Assert.NotNull(peak);
        Assert.Equal((2, 12.0, 1.0), (peak.Position, peak.PeakValue, peak.LitresBeforePeak));
        Assert.Equal(3.527, peak.PipeMetres, 3);
        Assert.Equal(0.2835, peak.LitresBeforePeak / peak.PipeMetres, 4);
        Assert.InRange(peak.LitresBeforePeak / peak.PipeMetres, 0.28, 0.29);
    }

    [Fact]
    public void Peak_Tie_TheEarlierBottleCounts()
    {
        var peak = Interpret(Sequential(Home(), Seq(1, 3), Seq(2, 9), Seq(3, 9))).Peak;
        Assert.Equal(2, peak?.Position);
    }

    [Fact]
    public void Peak_MissingPositionAndVolume_CountAsOneLiterBottles()
    {
        // Position 2 was not analysed and position 1 has no volume: 1 L each before bottle 3.
        var peak = Interpret(Sequential(Home(), Seq(1, 3, volumeMl: null), Seq(3, 14, volumeMl: 500))).Peak;
        Assert.Equal(2.0, peak?.LitresBeforePeak);
    }

    [Fact]
    public void Peak_InMessage_ShowsLitresAndMetresInBothLanguages()
    {
        var outcome = Interpret(Sequential(Home(), Seq(1, 3), Seq(2, 5), Seq(3, 16)));
        var message = Assert.Single(outcome.Messages, m => m.Code == "peak.further");
        Assert.Contains("bottle 3", message.En);
        Assert.Contains("2 liters", message.En);
        Assert.Contains("7.05 meters (23 feet)", message.En);
        Assert.Contains("2 litros", message.Es);
        Assert.Contains("7.05 metros (23 pies)", message.Es);
    }
}
