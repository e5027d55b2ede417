using CommunityLead.Rules.Interpretation;
using static CommunityLead.Tests.Rules.Interpretation.Kit;

namespace CommunityLead.Tests.Rules.Interpretation;

public class InterpreterCaseTests
{
    [Fact]
    public void Cases_AtLeastForty() => Assert.True(InterpreterCases.All.Count >= 40, $"{InterpreterCases.All.Count} cases");

    [Theory]
    [MemberData(nameof(InterpreterCases.Names), MemberType = typeof(InterpreterCases))]
    public void Interpret_RealisticKit_DecidesBandPatternFlagsAndMessages(string name)
    {
        var c = InterpreterCases.All[name];
        var outcome = Interpret(c.Kit, c.Profile, c.Program);
        var codes = Codes(outcome);

        Assert.Equal(c.Band, outcome.Band);
        Assert.Equal(c.Pattern, outcome.Pattern);
        Assert.Equal(c.Flags, outcome.Flags);
        Assert.All(c.Codes, code => Assert.Contains(code, codes));
        Assert.All(c.Absent ?? [], code => Assert.DoesNotContain(code, codes));
        if (c.Peak is { } peak)
        {
            Assert.NotNull(outcome.Peak);
            Assert.Equal(peak.Position, outcome.Peak.Position);
            Assert.Equal(peak.Metres, outcome.Peak.PipeMetres, 3);
        }
        else Assert.Null(outcome.Peak);
    }
}
