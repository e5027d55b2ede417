using BenchmarkDotNet.Attributes;
using BenchmarkDotNet.Engines;
using CommunityLead.Api.Features.Letters;
using CommunityLead.Api.Features.Letters.Composing;
using CommunityLead.Api.Features.Letters.Layout;
using CommunityLead.Api.Infrastructure;
using CommunityLead.Rules.Households;
using CommunityLead.Rules.Interpretation;
using CommunityLead.Rules.Kits;
using CommunityLead.Rules.LabResults;
using CommunityLead.Rules.Sampling;

namespace CommunityLead.Benchmarks;

/// <summary>
/// A mailing of 1,000 letters: composed from real interpretations (US LCRI profile), rendered to PDF.
/// Letters per second = 1,000 / the mean time.
/// </summary>
[MemoryDiagnoser]
[SimpleJob(RunStrategy.Monitoring, launchCount: 1, warmupCount: 1, iterationCount: 5)]
public class LetterRenderBenchmark
{
    private const int Letters = 1_000;
    private LetterContent[] contents = [];
    private readonly PdfLetterLayout layout = new();

    [GlobalSetup]
    public void Compose()
    {
        var file = SeedData.Find(Path.Combine("profiles", "us-lcri.json")) ?? throw new FileNotFoundException("us-lcri.json");
        var profile = ProfileReader.Read("us-lcri.json", File.ReadAllText(file));
        var settings = new LetterSettings("Brindle Cove Tap Check", ["12 Lantern Street", "Brindle Cove, Tallow County 00001"],
            "+1 555 0100", "tapcheck@example.org", null, "Tallow County Health Department", "+1 555 0140",
            "Brindle Cove Water Works", "+1 555 0150");
        var random = new Random(7);
        contents = [.. Enumerable.Range(0, Letters).Select(i =>
        {
            var child = i % 3 == 0;
            var facts = new KitFacts(KitKind.Water, new DateOnly(2026, 4, 3),
                new HouseholdContext(child, i % 7 == 0, WaterSource.Public, (ServiceLineMaterial)(i % 5), 1950 + i % 60, false),
                [
                    new BottleResult(BottleType.FirstDraw, null, null, 1000, Analyte.Lead, random.Next(5, 400) / 10.0, false, 1.0),
                    new BottleResult(BottleType.Flushed, null, null, 1000, Analyte.Lead, random.Next(5, 150) / 10.0, false, 1.0),
                ], []);
            var outcome = Interpreter.Interpret(facts, profile, new ProgramRules());
            return LetterComposer.Compose(outcome, profile.Name,
                new LetterRecipient($"Household {i}", $"{i} Heron Close", null, "Brindle Cove", "Tallow County", "00007"),
                i % 4 == 0 ? LetterLanguage.Es : LetterLanguage.En, outcome.Band == Band.Retest ? LetterKind.Retest : LetterKind.Results,
                KitCode.NewCode(), new DateOnly(2026, 4, 3), new DateOnly(2026, 4, 6), false, child, settings);
        })];
    }

    /// <summary>The floor: PDFsharp drawing a one-line page in the same font, as many pages as there are letters.</summary>
    [Benchmark(Baseline = true, Description = "1,000 one-line pages, PDFsharp alone")]
    public long OneLinePages()
    {
        long bytes = 0;
        for (var i = 0; i < Letters; i++) bytes += Http.Baselines.OneLinePage().Length;
        return bytes;
    }

    [Benchmark(Description = "Render 1,000 letters (layout only: the HTTP figure is in the performance table)")]
    public long RenderAll()
    {
        long bytes = 0;
        foreach (var content in contents) bytes += layout.Render(content).Length;
        return bytes;
    }
}
