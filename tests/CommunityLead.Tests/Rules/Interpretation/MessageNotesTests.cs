using CommunityLead.Rules.Interpretation;

namespace CommunityLead.Tests.Rules.Interpretation;

/// <summary>Every message carries a reviewer's note, so a new one can't reach households unreviewed.</summary>
public class MessageNotesTests
{
    [Fact]
    public void MessageNotes_EveryTemplate_HasANote()
    {
        var missing = MessageCatalog.All.Select(t => t.Code).Where(code => !MessageNotes.All.ContainsKey(code)).ToList();
        Assert.True(missing.Count == 0, "No note in MessageNotes for: " + string.Join(", ", missing));
    }

    [Fact]
    public void MessageNotes_NoNote_NamesAnUnknownCode()
    {
        var codes = MessageCatalog.All.Select(t => t.Code).ToHashSet(StringComparer.Ordinal);
        var unknown = MessageNotes.All.Keys.Where(code => !codes.Contains(code)).ToList();
        Assert.True(unknown.Count == 0, "Notes for no message: " + string.Join(", ", unknown));
    }

    [Fact]
    public void MessageNotes_EachNote_SaysWhenItIsSentAndWhatItRestsOn()
    {
        Assert.All(MessageNotes.All, n =>
        {
            Assert.True(n.Value.UsedWhen.Length >= 15 && n.Value.UsedWhen.EndsWith('.'), $"{n.Key}: used-when \"{n.Value.UsedWhen}\"");
            Assert.True(n.Value.Source.Length >= 10, $"{n.Key}: source \"{n.Value.Source}\"");
            // A note marked from memory must say so in its source, as tests and DOMAIN.md do.
            if (n.Value.Marker == WordingMarker.Memory) Assert.Contains("from memory", n.Value.Source);
        });
    }

    [Fact]
    public void MessageExamples_EveryTemplate_FillsEveryPlaceholder()
    {
        Assert.All(MessageCatalog.All, t =>
        {
            var example = MessageExamples.Filled(t);
            Assert.DoesNotContain("{", example.En + example.Es);
            Assert.Equal(t.Placeholders.Count == 0, example.En == t.En && example.Es == t.Es);
        });
    }

    [Fact]
    public void MessageExamples_ResultLines_UseNumbersThatFitTheMessage()
    {
        // A reviewer reads the examples: a low result must be below its level, an urgent one far above it.
        Assert.Equal("The first bottle had 3.2 µg/L of lead in it. The action level is 10 µg/L. This is below it.",
            MessageExamples.Filled(MessageCatalog.ResultLow).En);
        Assert.StartsWith("The first bottle had 145 µg/L of lead in it. The action level is 10 µg/L.", MessageExamples.Filled(MessageCatalog.ResultUrgent).En);
        Assert.StartsWith("Soil from the play area had 450 mg/kg of lead. The level for this place is 400 mg/kg.",
            MessageExamples.Filled(MessageCatalog.SoilResultAbove).En);
    }
}
