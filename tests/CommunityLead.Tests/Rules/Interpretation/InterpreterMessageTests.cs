using System.Globalization;
using CommunityLead.Rules.Interpretation;
using CommunityLead.Rules.LabResults;
using CommunityLead.Rules.Reading;
using CommunityLead.Rules.Sampling;
using Xunit.Abstractions;
using static CommunityLead.Tests.Rules.Interpretation.Kit;

namespace CommunityLead.Tests.Rules.Interpretation;

/// <summary>
/// Plain language: every English message at or below 8th grade (EPA asks for no more than 7th–8th; DOMAIN.md §7),
/// every message in Spanish too, the closing deferral last, and no utility wording for private wells.
/// </summary>
public class InterpreterMessageTests(ITestOutputHelper output)
{
    private const double MaxGrade = 8;

    /// <summary>Realistic values for the labels: every value the interpreter can give them.</summary>
    private static readonly Dictionary<string, Phrase[]> Labels = new()
    {
        ["bottle"] = [.. new[] { BottleType.FirstDraw, BottleType.FifthLiter, BottleType.Flushed, BottleType.Sequential }
            .Select(b => MessageWords.Bottle(b, 12))],
        ["location"] = [.. new SoilLocation?[] { SoilLocation.PlayArea, SoilLocation.Garden, SoilLocation.DripLine, SoilLocation.Yard, null }
            .Select(MessageWords.Location)],
        ["position"] = [MessageWords.Count(12)],
        ["litres"] = [MessageWords.Litres(5), MessageWords.Litres(0.75)],
        ["metres"] = [MessageWords.Metres(17.6), MessageWords.Metres(2.6)],
    };

    /// <summary>Realistic amounts that belong together: a result, its level, reporting limit and margin, one unit each.</summary>
    private static readonly Dictionary<string, Phrase>[] Amounts =
    [
        Amount(Analyte.Lead, Units.MicrogramsPerLiter, result: 12.3, level: 10, rl: 1),
        Amount(Analyte.Lead, Units.MicrogramsPerLiter, result: 145, level: 15, rl: 0.5),
        Amount(Analyte.Copper, "mg/L", result: 1.35, level: 1.3, rl: 0.02),
        Amount(Analyte.Lead, "mg/kg", result: 1450, level: 1200, rl: 20, margin: 30),
        Amount(Analyte.Lead, "mg/kg", result: 125, level: 100, rl: 15, margin: 12.5),
    ];

    private static Dictionary<string, Phrase> Amount(Analyte metal, string unit, double result, double level, double rl, double margin = 0) => new()
    {
        ["metal"] = MessageWords.Metal(metal),
        ["result"] = MessageWords.Amount(result, unit),
        ["level"] = MessageWords.Amount(level, unit),
        ["rl"] = MessageWords.Amount(rl, unit),
        ["margin"] = MessageWords.Amount(margin, unit),
        ["urgent"] = MessageWords.Amount(Math.Max(level * 5, 50), unit),
        ["hazard"] = MessageWords.Amount(Math.Max(level * 3, 400), unit),
    };

    [Fact]
    public void Catalog_CodesAreUnique_AndEveryMessageHasBothLanguages()
    {
        Assert.True(MessageCatalog.All.Count >= 50, $"{MessageCatalog.All.Count} templates");
        Assert.Equal(MessageCatalog.All.Count, MessageCatalog.All.Select(t => t.Code).Distinct().Count());
        Assert.All(MessageCatalog.All, t =>
        {
            Assert.False(string.IsNullOrWhiteSpace(t.En), t.Code);
            Assert.False(string.IsNullOrWhiteSpace(t.Es), t.Code);
            Assert.NotEqual(t.En, t.Es);
        });
    }

    [Fact]
    public void Catalog_EnglishAndSpanish_UseTheSamePlaceholders()
    {
        Assert.All(MessageCatalog.All, t =>
        {
            var en = MessageTemplateNames(t.En);
            var es = MessageTemplateNames(t.Es);
            Assert.True(en.SetEquals(es), $"{t.Code}: en {{{string.Join(",", en)}}} es {{{string.Join(",", es)}}}");
            Assert.All(en, name => Assert.True(Labels.ContainsKey(name) || Amounts[0].ContainsKey(name), $"{t.Code}: no sample value for {{{name}}}"));
        });
    }

    [Fact]
    public void EveryEnglishMessage_FilledWithRealisticValues_IsAtMostGradeEight()
    {
        var graded = MessageCatalog.All.SelectMany(Filled)
            .Select(m => (m.Code, m.En, Grade: Readability.FleschKincaidGrade(m.En)))
            .OrderByDescending(g => g.Grade).ToList();
        output.WriteLine("Hardest English messages:\n" + Describe(graded.DistinctBy(g => g.Code).Take(5)));
        var tooHard = graded.Where(g => g.Grade > MaxGrade).ToList();
        Assert.True(tooHard.Count == 0, "Above grade 8:\n" + Describe(tooHard));
        Assert.True(graded.Count > MessageCatalog.All.Count);
    }

    [Fact]
    public void EveryMessageTheCasesProduce_IsAtMostGradeEight_AndSpanishIsFilled()
    {
        var messages = AllOutcomes().SelectMany(o => o.Outcome.Messages).ToList();
        var tooHard = messages.Select(m => (m.Code, m.En, Grade: Readability.FleschKincaidGrade(m.En)))
            .Where(g => g.Grade > MaxGrade).DistinctBy(g => g.En).ToList();
        Assert.True(tooHard.Count == 0, "Above grade 8:\n" + Describe(tooHard));
        Assert.All(messages, m =>
        {
            Assert.False(string.IsNullOrWhiteSpace(m.Es), m.Code);
            Assert.DoesNotContain("{", m.En + m.Es);
        });
    }

    [Fact]
    public void EveryCatalogMessage_IsProducedBySomeCase()
    {
        var produced = AllOutcomes().SelectMany(o => o.Outcome.Messages).Select(m => m.Code).ToHashSet();
        var never = MessageCatalog.All.Select(t => t.Code).Where(code => !produced.Contains(code)).ToList();
        Assert.True(never.Count == 0, "Never produced: " + string.Join(", ", never));
    }

    [Fact]
    public void EveryInterpretation_EndsWithTheNotMedicalAdviceDeferral_AndSaysNoSafeLevel()
    {
        Assert.All(AllOutcomes(), o =>
        {
            var last = o.Outcome.Messages[^1];
            var well = o.Kit.Household.WaterSource == CommunityLead.Rules.Households.WaterSource.PrivateWell;
            Assert.Equal(o.Kit.Kind == CommunityLead.Rules.Kits.KitKind.Soil ? "closing.soil" : well ? "closing.well" : "closing.public", last.Code);
            Assert.Contains("not medical advice", last.En);
            Assert.Contains("no es un consejo médico", last.Es);
            Assert.Contains("health department", last.En);
            Assert.Contains("care.no-safe-level", Codes(o.Outcome));
        });
    }

    [Fact]
    public void PrivateWellHomes_NeverGetUtilityWording()
    {
        var wells = AllOutcomes().Where(o => o.Kit.Household.WaterSource == CommunityLead.Rules.Households.WaterSource.PrivateWell).ToList();
        Assert.True(wells.Count >= 4);
        Assert.All(wells.SelectMany(o => o.Outcome.Messages), m =>
        {
            Assert.DoesNotContain("utility", m.En, StringComparison.OrdinalIgnoreCase);
            Assert.DoesNotContain("compañía de agua", m.Es, StringComparison.OrdinalIgnoreCase);
        });
    }

    [Fact]
    public void Flags_AreSortedMostUrgentFirst()
    {
        Assert.All(AllOutcomes(), o => Assert.Equal(o.Outcome.Flags.Order(), o.Outcome.Flags));
    }

    [Fact]
    public void ResultLine_FillsValuesAndLevels_InEachLanguage()
    {
        var outcome = Interpret(SoilKit(Home(), Soil(SoilLocation.Yard, 1250, 30)), Levels.SoilHazard);
        var line = Assert.Single(outcome.Messages, m => m.Code == "soil.inconclusive");
        Assert.Equal("Soil from the yard had 1,250 mg/kg of lead, give or take 60 mg/kg. The level for this place is 1,200 mg/kg. " +
            "The result is too close to the level to be sure. We will confirm it with a lab sample.", line.En);
        Assert.StartsWith("La muestra de tierra tomada en el patio tenía 1250 mg/kg de plomo, con un margen de más o menos 60 mg/kg. " +
            "El nivel para ese lugar es de 1200 mg/kg.", line.Es);
    }

    private static IEnumerable<(KitFacts Kit, CommunityLead.Rules.Interpretation.Interpretation Outcome)> AllOutcomes() =>
        InterpreterCases.All.Values.Select(c => (c.Kit, Interpret(c.Kit, c.Profile, c.Program)));

    /// <summary>The template filled with every combination of label values and each set of amounts that fits it.</summary>
    private static IEnumerable<Message> Filled(MessageTemplate template)
    {
        var names = template.Placeholders;
        var amounts = Amounts.Where(a => !names.Contains("location") || a["result"].En.EndsWith("mg/kg"))
            .Where(a => !names.Contains("bottle") || !a["result"].En.EndsWith("mg/kg"));
        IEnumerable<Dictionary<string, Phrase>> combos = [.. amounts.Select(a => new Dictionary<string, Phrase>(a))];
        foreach (var name in names.Where(Labels.ContainsKey))
            combos = combos.SelectMany(c => Labels[name].Select(v => new Dictionary<string, Phrase>(c) { [name] = v }));
        return combos.Select(template.Fill);
    }

    private static HashSet<string> MessageTemplateNames(string text) =>
        [.. System.Text.RegularExpressions.Regex.Matches(text, @"\{(\w+)\}").Select(m => m.Groups[1].Value)];

    private static string Describe(IEnumerable<(string Code, string En, double Grade)> graded) =>
        string.Join("\n", graded.Take(15).Select(g => $"{g.Grade.ToString("0.00", CultureInfo.InvariantCulture)}  {g.Code}: {g.En}"));
}
