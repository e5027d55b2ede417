using System.Net;
using CommunityLead.Tests.Features.Interpretation;
using CommunityLead.Tests.Infrastructure;
using static CommunityLead.Tests.Infrastructure.Fixtures;

namespace CommunityLead.Tests.Features.Letters;

public class LetterConfirmationTests
{
    private static async Task<int> RenderAsync(HttpClient client, string code)
    {
        var response = await client.GetAsync($"/api/kits/{code}/letter");
        await Expect(response, HttpStatusCode.OK);
        return int.Parse(response.Headers.GetValues("X-Letter-Id").Single());
    }

    [Fact]
    public async Task LetterSent_AfterConfirming_AllowedActionsNoLongerOfferSendLetter()
    {
        using var app = new CommunityLeadFactory();
        var flow = new ResultsFlow(app);
        var code = await flow.ReceivedKitAsync();
        await flow.PostLeadAsync(code, firstDraw: 2, flushed: 1);
        static string[] Allowed(System.Text.Json.Nodes.JsonObject kit) =>
            [.. kit["allowedActions"]!.AsArray().Select(a => a!.GetValue<string>())];
        Assert.Contains("send-letter", Allowed(await GetAsync(flow.Coordinator, $"/api/kits/{code}")));

        await PostAsync(flow.Coordinator, $"/api/kits/{code}/letter/sent", new { letterId = await RenderAsync(flow.Coordinator, code) }, HttpStatusCode.OK);

        var sent = await GetAsync(flow.Coordinator, $"/api/kits/{code}");
        Assert.Equal("letter-sent", sent["state"]!.GetValue<string>());
        Assert.DoesNotContain("send-letter", Allowed(sent));
        Assert.Contains("close", Allowed(sent));
    }

    [Fact]
    public async Task LetterSent_ConfirmedTwice_SecondIs409AndFirstDateKept()
    {
        using var app = new CommunityLeadFactory();
        var flow = new ResultsFlow(app);
        var code = await flow.ReceivedKitAsync();
        await flow.PostLeadAsync(code, firstDraw: 2, flushed: 1);
        var id = await RenderAsync(flow.Coordinator, code);
        await PostAsync(flow.Coordinator, $"/api/kits/{code}/letter/sent", new { letterId = id }, HttpStatusCode.OK);
        app.Clock.Now = app.Clock.Now.AddDays(5);
        await PostAsync(flow.Coordinator, $"/api/kits/{code}/letter/sent", new { letterId = id }, HttpStatusCode.Conflict);
        Assert.Equal(7, app.WithDb(db => db.Letters.Single(l => l.Id == id).DaysFromCollection));
    }

    [Fact]
    public async Task LetterSent_OldLetterAfterReinterpretation_409AndCurrentOneConfirms()
    {
        using var app = new CommunityLeadFactory();
        var flow = new ResultsFlow(app);
        var code = await flow.ReceivedKitAsync();
        await flow.PostLeadAsync(code, firstDraw: 2, flushed: 1);
        var old = await RenderAsync(flow.Coordinator, code);
        // Interpreted again the same day with the same outcome: the new letter has the same bytes but a new record.
        await PostAsync(flow.Coordinator, $"/api/kits/{code}/interpretation", null, HttpStatusCode.OK);
        var current = await RenderAsync(flow.Coordinator, code);
        Assert.NotEqual(old, current);
        await PostAsync(flow.Coordinator, $"/api/kits/{code}/letter/sent", new { letterId = old }, HttpStatusCode.Conflict);
        await PostAsync(flow.Coordinator, $"/api/kits/{code}/letter/sent", new { }, HttpStatusCode.OK);
        Assert.Equal("letter-sent", (await GetAsync(flow.Coordinator, $"/api/kits/{code}"))["state"]!.GetValue<string>());
    }
}
