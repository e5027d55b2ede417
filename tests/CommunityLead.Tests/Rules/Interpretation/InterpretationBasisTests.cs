using CommunityLead.Rules.Interpretation;
using CommunityLead.Rules.Sampling;
using static CommunityLead.Tests.Rules.Interpretation.Kit;

namespace CommunityLead.Tests.Rules.Interpretation;

/// <summary>An interpretation is "made from" the results in effect when its findings hold the same bottles and figures.</summary>
public class InterpretationBasisTests
{
    [Fact]
    public void InterpretationBasis_SameFiguresInAnotherOrder_MadeFromThem()
    {
        var interpretation = Interpret(Water(First(12.4), Flushed(3.1), Copper(0.4)));

        Assert.True(InterpretationBasis.MadeFrom(interpretation, [Copper(0.4), Flushed(3.1), First(12.4)]));
    }

    [Fact]
    public void InterpretationBasis_OneFigureCorrected_NotMadeFromTheNewResults()
    {
        var interpretation = Interpret(Water(First(12.4), Flushed(3.1)));

        Assert.False(InterpretationBasis.MadeFrom(interpretation, [First(75), Flushed(3.1)]));
    }

    [Fact]
    public void InterpretationBasis_ResultAddedOrLeftOut_NotMadeFromThem()
    {
        var interpretation = Interpret(Water(First(12.4), Flushed(3.1)));

        Assert.False(InterpretationBasis.MadeFrom(interpretation, [First(12.4), Flushed(3.1), Copper(0.4)]));
        Assert.False(InterpretationBasis.MadeFrom(interpretation, [First(12.4)]));
    }

    [Fact]
    public void InterpretationBasis_SameValueNowBelowReportingLimit_NotMadeFromIt()
    {
        // "< 1" is a censored result, not the figure 1: a correction to "below the limit" changes the meaning.
        var interpretation = Interpret(Water(Lead(BottleType.FirstDraw, 1), Flushed(3.1)));

        Assert.False(InterpretationBasis.MadeFrom(interpretation, [NotDetected(BottleType.FirstDraw), Flushed(3.1)]));
    }
}
