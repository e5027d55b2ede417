using System.Net;
using System.Text.Json.Nodes;
using CommunityLead.Tests.Features.Interpretation;
using CommunityLead.Tests.Infrastructure;
using static CommunityLead.Tests.Features.LabResults.LabFixtures;
using static CommunityLead.Tests.Infrastructure.Fixtures;

namespace CommunityLead.Tests.Features.Letters;

/// <summary>
/// GET /api/kits/{code}/letter/words: the words of a kit's letter as it would be printed now, so the kit page can
/// show a held letter (never issued, so without stored words) as it shows any other. It records nothing.
/// </summary>
public class LetterDraftWordsTests
{
    private static readonly Action<JsonObject> English = h => h["language"] = "en";

    private static string Rows(JsonNode words) => words["results"]!["rows"]!.ToJsonString();

    [Fact]
    public async Task LetterWords_HeldLetter_NotReleasedNamingTheItemInEitherLanguageAndNothingRecorded()
    {
        using var app = new CommunityLeadFactory();
        var flow = new ResultsFlow(app);
        var kit = await flow.ReceivedKitAsync(English);
        await flow.PostLeadAsync(kit, firstDraw: 65, flushed: 4); // at or above the urgent setting (50 µg/L, common practice)
        var urgent = (await GetArrayAsync(flow.Coordinator, "/api/attention"))
            .Single(a => a!["kitCode"]!.GetValue<string>() == kit && a["reason"]!.GetValue<string>() == "urgent")!["id"]!.GetValue<int>();

        var words = await GetAsync(flow.Coordinator, $"/api/kits/{kit}/letter/words");
        var spanish = await GetAsync(flow.Coordinator, $"/api/kits/{kit}/letter/words?lang=es");

        Assert.False(words["released"]!.GetValue<bool>());
        Assert.Equal([urgent], words["awaitingAttention"]!.AsArray().Select(i => i!.GetValue<int>()));
        Assert.Equal("en", words["language"]!.GetValue<string>());
        Assert.Contains("65", Rows(words));
        Assert.Equal(4, words["sections"]!.AsArray().Count);
        Assert.Equal("es", spanish["language"]!.GetValue<string>());
        Assert.Equal("Muestra", spanish["results"]!["headers"]![0]!.GetValue<string>());
        Assert.False(spanish["released"]!.GetValue<bool>());
        Assert.Equal(0, app.WithDb(db => db.Letters.Count()));
        Assert.Equal("interpreted", await KitStateAsync(flow.Coordinator, kit));
    }

    [Fact]
    public async Task LetterWords_Released_TheWordsOfTheLetterThenPrinted()
    {
        using var app = new CommunityLeadFactory();
        var flow = new ResultsFlow(app);
        var kit = await flow.ReceivedKitAsync(English);
        await flow.PostLeadAsync(kit, firstDraw: 4, flushed: 1);

        var draft = await GetAsync(flow.Coordinator, $"/api/kits/{kit}/letter/words");
        var printed = await flow.Coordinator.GetAsync($"/api/kits/{kit}/letter");
        await Expect(printed, HttpStatusCode.OK);
        var stored = await GetAsync(flow.Coordinator, $"/api/letters/{printed.Headers.GetValues("X-Letter-Id").Single()}/words");

        Assert.True(draft["released"]!.GetValue<bool>());
        Assert.Empty(draft["awaitingAttention"]!.AsArray());
        foreach (var part in new[] { "title", "facts", "results", "sections", "closing" })
            Assert.Equal(stored[part]!.ToJsonString(), draft[part]!.ToJsonString());
    }

    [Fact]
    public async Task LetterWords_NoResultsYetOrUnknownLanguage_409WithTheStateAnd400NamingTheField()
    {
        using var app = new CommunityLeadFactory();
        var flow = new ResultsFlow(app);
        var kit = await flow.ReceivedKitAsync(English);

        var early = await GetAsync(flow.Coordinator, $"/api/kits/{kit}/letter/words", HttpStatusCode.Conflict);
        var bad = await GetAsync(flow.Coordinator, $"/api/kits/{kit}/letter/words?lang=fr", HttpStatusCode.BadRequest);

        Assert.Equal("received", early["currentState"]!.GetValue<string>());
        Assert.Contains("en or es", bad["errors"]!["lang"]![0]!.GetValue<string>());
    }
}
