using System.Net.Http.Json;
using System.Text.Json.Nodes;
using CommunityLead.Api.Features.Wording;
using CommunityLead.Tests.Features.Interpretation;
using CommunityLead.Tests.Infrastructure;
using static CommunityLead.Tests.Infrastructure.Fixtures;

namespace CommunityLead.Tests.Features.Letters;

public class LetterCatalogVersionTests
{
    [Fact]
    public async Task LetterListing_IssuedLetters_ShowTheWordingVersionTheyWereWrittenWith()
    {
        using var app = new CommunityLeadFactory();
        var flow = new ResultsFlow(app);
        var code = await flow.ReceivedKitAsync(h => h["language"] = "es");
        await flow.PostLeadAsync(code, firstDraw: 12.4, flushed: 3.1);
        await Expect(await flow.Coordinator.GetAsync($"/api/kits/{code}/letter"), System.Net.HttpStatusCode.OK);
        await Expect(await flow.Coordinator.GetAsync($"/api/kits/{code}/letter?lang=en"), System.Net.HttpStatusCode.OK);

        var letters = (await flow.Coordinator.GetFromJsonAsync<JsonArray>($"/api/kits/{code}/letters"))!;
        Assert.Equal(2, letters.Count);
        // The version of GET /api/admin/messages and `messages export`, which covers the letter's own words too.
        Assert.All(letters, l => Assert.Equal(WordingCatalogue.Version, l!["catalogVersion"]!.GetValue<string>()));
        Assert.Equal(WordingCatalogue.Version, app.WithDb(db => db.Letters.Select(l => l.CatalogVersion).Distinct().Single()));
        Assert.NotNull(letters[0]!["sha256"]);   // the listing's earlier fields are still there (extend, never rename)
    }
}
