using System.Globalization;
using CommunityLead.Rules.Interpretation;
using CommunityLead.Rules.Reading;
using CommunityLead.Rules.Sampling;
using Xunit.Abstractions;

namespace CommunityLead.Tests.Rules.Interpretation;

/// <summary>
/// Every Spanish message at "normal" or easier on the INFLESZ scale: Szigriszt-Pazos perspicuity of at least 55
/// (Szigriszt-Pazos 1993; Barrio-Cantalejo et al. 2008; DOMAIN.md §7, constants and band limits from memory).
/// Each template is filled with the typical values of <see cref="MessageExamples"/>, and again with every bottle
/// and soil place the interpreter can name, since those phrases differ most in length.
/// </summary>
public class SpanishMessageReadabilityTests(ITestOutputHelper output)
{
    private static readonly Phrase[] Bottles = [.. new[] { BottleType.FirstDraw, BottleType.FifthLiter, BottleType.Flushed, BottleType.Sequential }
        .Select(b => MessageWords.Bottle(b, 12))];

    private static readonly Phrase[] Places = [.. new SoilLocation?[] { SoilLocation.PlayArea, SoilLocation.Garden, SoilLocation.DripLine, SoilLocation.Yard, null }
        .Select(MessageWords.Location)];

    [Fact]
    public void EverySpanishMessage_FilledWithTypicalValues_IsNormalOrEasier()
    {
        var scored = MessageCatalog.All.SelectMany(Filled)
            .Select(m => (m.Code, m.Es, Score: SpanishReadability.Perspicuity(m.Es)))
            .OrderBy(s => s.Score).ToList();
        output.WriteLine("Hardest Spanish messages:\n" + Describe(scored.DistinctBy(s => s.Code).Take(8)));

        var tooHard = scored.Where(s => s.Score < SpanishReadability.NormalFrom).DistinctBy(s => s.Es).ToList();
        Assert.True(tooHard.Count == 0, "Harder than INFLESZ \"normal\" (below 55):\n" + Describe(tooHard));
        Assert.True(scored.Count > MessageCatalog.All.Count);
    }

    [Fact]
    public void EverySpanishMessage_TheInterpreterProduces_IsNormalOrEasier()
    {
        var tooHard = InterpreterCases.All.Values
            .SelectMany(c => Kit.Interpret(c.Kit, c.Profile, c.Program).Messages)
            .DistinctBy(m => m.Es)
            .Select(m => (m.Code, m.Es, Score: SpanishReadability.Perspicuity(m.Es)))
            .Where(s => s.Score < SpanishReadability.NormalFrom).ToList();
        Assert.True(tooHard.Count == 0, "Harder than INFLESZ \"normal\" (below 55):\n" + Describe(tooHard));
    }

    private static IEnumerable<Message> Filled(MessageTemplate template)
    {
        var typical = MessageExamples.For(template.Code);
        yield return template.Fill(typical);
        if (template.Placeholders.Contains("bottle"))
            foreach (var bottle in Bottles)
                yield return template.Fill(new Dictionary<string, Phrase>(typical) { ["bottle"] = bottle });
        if (template.Placeholders.Contains("location"))
            foreach (var place in Places)
                yield return template.Fill(new Dictionary<string, Phrase>(typical) { ["location"] = place });
    }

    private static string Describe(IEnumerable<(string Code, string Es, double Score)> scored) =>
        string.Join("\n", scored.Take(20).Select(s => $"{s.Score.ToString("0.0", CultureInfo.InvariantCulture)} {Counts(s.Es)}  {s.Code}: {s.Es}"));

    /// <summary>Sentences, words and syllables, so a failing message shows which to shorten.</summary>
    private static string Counts(string text) =>
        SpanishReadability.Count(text) is var c ? $"({c.Sentences} s, {c.Words} w, {c.Syllables} syl)" : "";
}
