using System.IO.Compression;
using System.Net;
using System.Net.Http.Headers;
using System.Text.Json.Nodes;
using CommunityLead.Api.Auth;
using CommunityLead.Tests.Features.Interpretation;
using CommunityLead.Tests.Infrastructure;
using UglyToad.PdfPig;
using UglyToad.PdfPig.DocumentLayoutAnalysis.TextExtractor;
using static CommunityLead.Tests.Features.LabResults.LabFixtures;
using static CommunityLead.Tests.Infrastructure.Fixtures;

namespace CommunityLead.Tests.Features.Letters;

/// <summary>
/// The release gate: a letter for an urgent or implausible result is only a preview until a coordinator resolves the
/// kit's urgent and implausible items with a note (checked the result, called the household).
/// </summary>
public class LetterReleaseTests
{
    private const string Banner = "Preview — not yet released: a coordinator must check this result and call the household first.";

    // The test household writes in Spanish by default; most of these read the English letter.
    private static readonly Action<JsonObject> English = h => h["language"] = "en";

    private static HttpClient Desk(CommunityLeadFactory app, string label)
    {
        var client = app.CreateClient();
        client.DefaultRequestHeaders.Authorization = new AuthenticationHeaderValue("Bearer", app.CreateKey(Roles.Coordinator, label));
        return client;
    }

    private static async Task<List<JsonNode>> ItemsAsync(HttpClient coordinator, string kit) =>
        [.. (await GetArrayAsync(coordinator, "/api/attention")).Where(a => a!["kitCode"]!.GetValue<string>() == kit).Select(a => a!)];

    private static async Task<int> ItemAsync(HttpClient coordinator, string kit, string reason) =>
        (await ItemsAsync(coordinator, kit)).Single(a => a["reason"]!.GetValue<string>() == reason)["id"]!.GetValue<int>();

    private static Task ResolveAsync(HttpClient desk, int item, string note = "Checked the figure with the lab; called the household.") =>
        PostAsync(desk, $"/api/attention/{item}/resolve", new { note }, HttpStatusCode.NoContent);

    private static async Task<HttpResponseMessage> LetterAsync(HttpClient coordinator, string kit)
    {
        var response = await coordinator.GetAsync($"/api/kits/{kit}/letter");
        await Expect(response, HttpStatusCode.OK);
        return response;
    }

    private static string Header(HttpResponseMessage response, string name) =>
        response.Headers.TryGetValues(name, out var values) ? values.Single() : "";

    /// <summary>Each page's text with whitespace folded, so a wrapped line reads as one.</summary>
    private static List<string> Pages(byte[] pdf)
    {
        using var document = PdfDocument.Open(pdf);
        return [.. document.GetPages().Select(p => string.Join(' ',
            ContentOrderTextExtractor.GetText(p).Split((char[])[' ', '\n', '\r', '\t'], StringSplitOptions.RemoveEmptyEntries)))];
    }

    /// <summary>A lab row of "2.0 ppm" lead: 2,000 µg/L once normalised (1 ppm = 1 mg/L = 1,000 µg/L, DOMAIN.md units).</summary>
    private static async Task<string> PpmKitAsync(ResultsFlow flow)
    {
        var kit = await flow.ReceivedKitAsync(English);
        await PostBatchAsync(flow.Lab, Batch($"PPM-{kit}", [Result(kit, "first-draw", 2.0, unit: "ppm"), Result(kit, "flushed", 1.5)]),
            HttpStatusCode.Created);
        return kit;
    }

    [Fact]
    public async Task Attention_PpmWrittenForPpb_ImplausibleRightAfterUrgentWithTheReason()
    {
        using var app = new CommunityLeadFactory();
        var flow = new ResultsFlow(app);
        var kit = await PpmKitAsync(flow);

        var items = await ItemsAsync(flow.Coordinator, kit);

        // The test home has a child under 6, hence the vulnerable-home action item after the two.
        Assert.Equal(["urgent", "implausible", "action-level-vulnerable-home"], items.Select(a => a["reason"]!.GetValue<string>()));
        var detail = items[1]["detail"]!.GetValue<string>();
        // 1,000 µg/L: the default of Interpretation:Plausibility:LeadWaterMaxUgL (common practice, our choice).
        Assert.StartsWith("Lead 2,000 µg/L in the first draw is above 1,000 µg/L", detail);
        Assert.Contains("ppm vs ppb", detail);
        var implausible = Assert.Single((await flow.InterpretationAsync(kit))["implausible"]!.AsArray())!;
        Assert.Equal("above-tap-water-range", implausible["reason"]!.GetValue<string>());
        Assert.Equal(2000, implausible["value"]!.GetValue<double>());
    }

    [Fact]
    public async Task Letter_UrgentResultNotReleased_PreviewWithBannerOnEveryPageAndNothingRecorded()
    {
        using var app = new CommunityLeadFactory();
        var flow = new ResultsFlow(app);
        var kit = await flow.ReceivedKitAsync(English);
        await flow.PostLeadAsync(kit, firstDraw: 65, flushed: 4); // at or above the urgent setting (50 µg/L, common practice)
        var urgent = await ItemAsync(flow.Coordinator, kit, "urgent");

        var response = await LetterAsync(flow.Coordinator, kit);

        Assert.Equal("false", Header(response, "X-Letter-Released"));
        Assert.Equal($"{urgent}", Header(response, "X-Letter-Awaiting-Attention"));
        Assert.False(response.Headers.Contains("X-Letter-Id"));
        var pages = Pages(await response.Content.ReadAsByteArrayAsync());
        Assert.All(pages, page => Assert.Contains(Banner, page));
        Assert.Contains(pages, page => page.Contains("65 µg/L"));  // the letter itself is under the banner
        Assert.Equal(0, app.WithDb(db => db.Letters.Count()));
    }

    [Fact]
    public async Task Letter_SpanishHouseholdNotReleased_BannerInSpanish()
    {
        using var app = new CommunityLeadFactory();
        var flow = new ResultsFlow(app);
        var kit = await flow.ReceivedKitAsync(h => h["language"] = "es");
        await flow.PostLeadAsync(kit, firstDraw: 65, flushed: 4);

        var pages = Pages(await (await LetterAsync(flow.Coordinator, kit)).Content.ReadAsByteArrayAsync());

        Assert.All(pages, page => Assert.Contains(
            "Vista previa — aún no autorizada: un coordinador debe revisar este resultado y llamar primero al hogar.", page));
        Assert.All(pages, page => Assert.DoesNotContain("Preview", page));
    }

    [Fact]
    public async Task LetterSent_BeforeRelease_409NamingTheItemToResolve()
    {
        using var app = new CommunityLeadFactory();
        var flow = new ResultsFlow(app);
        var kit = await flow.ReceivedKitAsync(English);
        await flow.PostLeadAsync(kit, firstDraw: 65, flushed: 4);
        var urgent = await ItemAsync(flow.Coordinator, kit, "urgent");
        await LetterAsync(flow.Coordinator, kit);

        var problem = await PostAsync(flow.Coordinator, $"/api/kits/{kit}/letter/sent", new { }, HttpStatusCode.Conflict);

        Assert.Contains($"attention item {urgent} (urgent)", problem["detail"]!.GetValue<string>());
        var awaiting = Assert.Single(problem["awaitingRelease"]!.AsArray())!;
        Assert.Equal(urgent, awaiting["id"]!.GetValue<int>());
        Assert.Equal($"/api/attention/{urgent}/resolve", awaiting["resolve"]!.GetValue<string>());
        Assert.Equal("interpreted", await KitStateAsync(flow.Coordinator, kit));
    }

    [Fact]
    public async Task LetterBatch_HeldKit_ListedAwaitingReleaseWithoutItsPdf()
    {
        using var app = new CommunityLeadFactory();
        var flow = new ResultsFlow(app);
        var ready = await flow.ReceivedKitAsync(English);
        await flow.PostLeadAsync(ready, firstDraw: 4, flushed: 1);
        var held = await flow.ReceivedKitAsync(English);
        await flow.PostLeadAsync(held, firstDraw: 65, flushed: 4);
        var urgent = await ItemAsync(flow.Coordinator, held, "urgent");

        var response = await flow.Coordinator.PostAsync("/api/letters/batch?combined=true", null);

        await Expect(response, HttpStatusCode.OK);
        using var zip = new ZipArchive(new MemoryStream(await response.Content.ReadAsByteArrayAsync()));
        var pdfs = zip.Entries.Where(e => e.FullName.StartsWith("letters/")).Select(e => e.Name).ToList();
        Assert.Equal([$"letter-{ready}-en.pdf"], pdfs);
        var manifest = new StreamReader(zip.GetEntry("manifest.csv")!.Open()).ReadToEnd().Split('\n', StringSplitOptions.RemoveEmptyEntries);
        Assert.Equal("kitCode,letterId,kind,language,pages,sha256,status,reason", manifest[0]);
        Assert.StartsWith($"{ready},", manifest[1]);
        Assert.EndsWith(",issued,", manifest[1]);
        Assert.StartsWith($"{held},,,,,,awaiting-release,\"", manifest[2]);
        Assert.Contains($"attention item {urgent} (urgent)", manifest[2]);
        using var combined = new MemoryStream();
        await zip.GetEntry("all-letters.pdf")!.Open().CopyToAsync(combined);
        var text = LetterPdfText.Read(combined.ToArray()).Flat;
        Assert.Contains(ready, text);
        Assert.DoesNotContain(held, text);
        Assert.Equal([ready], app.WithDb(db => db.Letters.Select(l => l.KitCode).ToList()));
    }

    [Fact]
    public async Task Letter_ReleasedByResolvingTheItem_IssuedWithWhoReleasedItAndConfirmable()
    {
        using var app = new CommunityLeadFactory();
        var flow = new ResultsFlow(app);
        var kit = await flow.ReceivedKitAsync(English);
        await flow.PostLeadAsync(kit, firstDraw: 65, flushed: 4);
        var plain = await flow.ReceivedKitAsync(English);
        await flow.PostLeadAsync(plain, firstDraw: 4, flushed: 1);
        app.Clock.Now = app.Clock.Now.AddHours(2);
        var releasedAt = app.Clock.Now.UtcDateTime;
        await ResolveAsync(Desk(app, "desk-odile"), await ItemAsync(flow.Coordinator, kit, "urgent"));

        var response = await LetterAsync(flow.Coordinator, kit);

        Assert.Equal("true", Header(response, "X-Letter-Released"));
        Assert.DoesNotContain(Pages(await response.Content.ReadAsByteArrayAsync()), page => page.Contains("Preview"));
        var letter = Assert.Single(await GetArrayAsync(flow.Coordinator, $"/api/kits/{kit}/letters"))!;
        Assert.Equal(Header(response, "X-Letter-Id"), $"{letter["id"]}");
        Assert.Equal("desk-odile", letter["releasedBy"]!.GetValue<string>());
        Assert.Equal(releasedAt, letter["releasedAt"]!.GetValue<DateTime>().ToUniversalTime());
        await PostAsync(flow.Coordinator, $"/api/kits/{kit}/letter/sent", new { }, HttpStatusCode.OK);
        Assert.Equal("letter-sent", await KitStateAsync(flow.Coordinator, kit));
        // A letter that needed no person first records no release.
        await LetterAsync(flow.Coordinator, plain);
        var ordinary = Assert.Single(await GetArrayAsync(flow.Coordinator, $"/api/kits/{plain}/letters"))!;
        Assert.Null(ordinary["releasedBy"]);
        Assert.Null(ordinary["releasedAt"]);
    }

    [Fact]
    public async Task Letter_UrgentAndImplausible_ReleasedOnlyWhenBothAreResolved()
    {
        using var app = new CommunityLeadFactory();
        var flow = new ResultsFlow(app);
        var kit = await PpmKitAsync(flow);
        var (urgent, implausible) = (await ItemAsync(flow.Coordinator, kit, "urgent"), await ItemAsync(flow.Coordinator, kit, "implausible"));

        await ResolveAsync(Desk(app, "desk-a"), urgent, "Called the household: bottled water until we know more.");
        var stillHeld = await LetterAsync(flow.Coordinator, kit);
        var problem = await PostAsync(flow.Coordinator, $"/api/kits/{kit}/letter/sent", new { }, HttpStatusCode.Conflict);
        app.Clock.Now = app.Clock.Now.AddMinutes(30);
        await ResolveAsync(Desk(app, "desk-b"), implausible, "Lab confirmed the unit was ppb: corrected batch on its way.");
        var released = await LetterAsync(flow.Coordinator, kit);

        Assert.Equal(("false", $"{implausible}"), (Header(stillHeld, "X-Letter-Released"), Header(stillHeld, "X-Letter-Awaiting-Attention")));
        Assert.Equal(implausible, Assert.Single(problem["awaitingRelease"]!.AsArray())!["id"]!.GetValue<int>());
        Assert.Equal("true", Header(released, "X-Letter-Released"));
        // Whoever resolved the last item released the letter.
        Assert.Equal("desk-b", app.WithDb(db => db.Letters.Single().ReleasedBy));
    }

    [Fact]
    public async Task Letter_LabCorrectionAfterRelease_HeldAgainUntilTheNewItemIsResolved()
    {
        using var app = new CommunityLeadFactory();
        var flow = new ResultsFlow(app);
        var kit = await flow.ReceivedKitAsync(English);
        await PostBatchAsync(flow.Lab, Batch("GATE-1", BothBottles(kit, firstDraw: 65, flushed: 4)), HttpStatusCode.Created);
        var first = await ItemAsync(flow.Coordinator, kit, "urgent");
        await ResolveAsync(flow.Coordinator, first);
        Assert.Equal("true", Header(await LetterAsync(flow.Coordinator, kit), "X-Letter-Released"));

        var correction = Batch("GATE-1", BothBottles(kit, firstDraw: 82, flushed: 4));
        correction["correction"] = true;
        correction["correctionReason"] = "The first-draw bottle was diluted twice; analysed again.";
        await PostBatchAsync(flow.Lab, correction, HttpStatusCode.Created);
        var second = await ItemAsync(flow.Coordinator, kit, "urgent");

        Assert.NotEqual(first, second);
        var response = await LetterAsync(flow.Coordinator, kit);
        Assert.Equal(("false", $"{second}"), (Header(response, "X-Letter-Released"), Header(response, "X-Letter-Awaiting-Attention")));
        var problem = await PostAsync(flow.Coordinator, $"/api/kits/{kit}/letter/sent", new { }, HttpStatusCode.Conflict);
        Assert.Equal(second, Assert.Single(problem["awaitingRelease"]!.AsArray())!["id"]!.GetValue<int>());
        await ResolveAsync(flow.Coordinator, second);
        Assert.Equal("true", Header(await LetterAsync(flow.Coordinator, kit), "X-Letter-Released"));
        await PostAsync(flow.Coordinator, $"/api/kits/{kit}/letter/sent", new { }, HttpStatusCode.OK);
    }
}
