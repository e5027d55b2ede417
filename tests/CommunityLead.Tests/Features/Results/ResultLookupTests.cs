using System.Net;
using System.Net.Http.Json;
using System.Text.Json.Nodes;
using CommunityLead.Api.Auth;
using CommunityLead.Api.Features.Results;
using CommunityLead.Tests.Auth;
using CommunityLead.Tests.Infrastructure;
using Microsoft.Extensions.DependencyInjection;
using UglyToad.PdfPig;

namespace CommunityLead.Tests.Features.Results;

public class ResultLookupTests
{
    public static CommunityLeadFactory WithResultPage(int lookups = 1000)
    {
        var app = new CommunityLeadFactory();
        app.Settings["ResultAccess:SecretKey"] = "test-only-key-for-result-secrets-0123456789";
        app.Settings["ResultAccess:PageAddress"] = "https://tapcheck.example.org/ui/result/";
        app.Settings["ResultAccess:LookupsPerAddress"] = lookups.ToString();
        return app;
    }

    /// <summary>An interpreted kit whose letter the coordinator issued; its code and the secret printed on it.</summary>
    public static async Task<(string Code, string Secret, int LetterId)> IssuedLetterAsync(CommunityLeadFactory app, HttpClient coordinator)
    {
        var (code, id) = await new RouteSetup(app, coordinator).LetterAsync();
        return (code, app.Services.GetRequiredService<ResultSecrets>().For(code), id);
    }

    [Fact]
    public async Task LetterWords_TheCoordinatorsPreview_AreTheWordsTheHouseholdSees()
    {
        using var app = WithResultPage();
        var coordinator = app.CreateClient(Roles.Coordinator);
        var (code, secret, letterId) = await IssuedLetterAsync(app, coordinator);

        var preview = await coordinator.GetAsync($"/api/letters/{letterId}/words");
        Assert.Equal(HttpStatusCode.OK, preview.StatusCode);
        var household = await app.CreateClient().PostAsJsonAsync("/api/results", new { code, secret });
        Assert.Equal(JsonNode.Parse(await household.Content.ReadAsStringAsync())!.ToJsonString(),
            JsonNode.Parse(await preview.Content.ReadAsStringAsync())!.ToJsonString());

        Assert.Equal(HttpStatusCode.NotFound, (await coordinator.GetAsync($"/api/letters/{letterId + 1000}/words")).StatusCode);
        Assert.Equal(HttpStatusCode.Forbidden, (await app.CreateClient(Roles.Lab).GetAsync($"/api/letters/{letterId}/words")).StatusCode);
    }

    [Fact]
    public async Task Result_CodeAndSecretFromTheLetter_ShowsItsWordsAndLetter_SecretStoredOnlyHashed()
    {
        using var app = WithResultPage();
        var coordinator = app.CreateClient(Roles.Coordinator);
        var (code, secret, letterId) = await IssuedLetterAsync(app, coordinator);

        // The letter prints the secret; the stored letter and the kit hold no plain secret, and it renders again identically.
        var reread = await coordinator.GetAsync($"/api/letters/{letterId}");
        Assert.Equal("true", reread.Headers.GetValues("X-Letter-Identical").Single());
        using (var pdf = PdfDocument.Open(await reread.Content.ReadAsByteArrayAsync()))
            Assert.Contains(secret, string.Join(" ", pdf.GetPages().Select(p => p.Text)));
        var (contentJson, hash) = app.WithDb(db => (db.Letters.Single(l => l.Id == letterId).ContentJson, db.Kits.Single(k => k.Code == code).ResultSecretHash));
        Assert.DoesNotContain(secret, contentJson);
        Assert.Contains("{secret}", contentJson);
        Assert.Equal(ResultSecrets.Hash(secret), hash);

        var household = app.CreateClient();
        // Typed on a phone: lower case, no hyphen.
        var result = await household.PostAsJsonAsync("/api/results", new { code = code.ToLowerInvariant(), secret = secret.Replace("-", "").ToLowerInvariant() });
        Assert.Equal(HttpStatusCode.OK, result.StatusCode);
        var body = JsonNode.Parse(await result.Content.ReadAsStringAsync())!;
        Assert.Equal("es", body["language"]!.GetValue<string>()); // the fixture's household reads Spanish
        Assert.Equal(4, body["sections"]!.AsArray().Count);
        Assert.Contains("departamento de salud", body.ToJsonString(), StringComparison.OrdinalIgnoreCase);

        var letter = await household.PostAsJsonAsync("/api/results/letter", new { code, secret });
        Assert.Equal(HttpStatusCode.OK, letter.StatusCode);
        Assert.Equal("application/pdf", letter.Content.Headers.ContentType!.MediaType);
    }

    [Fact]
    public async Task Result_WrongSecretWrongCodeOrCodeAlone_SameAnswer()
    {
        using var app = WithResultPage();
        var coordinator = app.CreateClient(Roles.Coordinator);
        var (code, secret, _) = await IssuedLetterAsync(app, coordinator);
        var other = await new RouteSetup(app, coordinator).InterpretedKitAsync(firstDrawLead: 3.2); // no letter issued yet
        var household = app.CreateClient();

        async Task<string> RefusedAsync(object body)
        {
            var response = await household.PostAsJsonAsync("/api/results", body);
            Assert.Equal(HttpStatusCode.NotFound, response.StatusCode);
            var problem = JsonNode.Parse(await response.Content.ReadAsStringAsync())!;
            return $"{problem["title"]}|{problem["detail"]}";
        }
        var wrongSecret = await RefusedAsync(new { code, secret = "ZZZZZ-ZZZZZ" });
        Assert.Equal(wrongSecret, await RefusedAsync(new { code = LabResults.LabFixtures.NeverIssuedCode(), secret }));
        Assert.Equal(wrongSecret, await RefusedAsync(new { code = other, secret = app.Services.GetRequiredService<ResultSecrets>().For(other) }));
        Assert.Equal(wrongSecret, await RefusedAsync(new { code = "not a code", secret }));
        // The code alone is not enough: the secret is required, named as a field.
        var alone = await household.PostAsJsonAsync("/api/results", new { code });
        Assert.Equal(HttpStatusCode.BadRequest, alone.StatusCode);
        Assert.Contains("secret", await alone.Content.ReadAsStringAsync());
    }

    [Fact]
    public async Task Result_ManyLookupsFromOneAddress_429WithRetryAfter()
    {
        using var app = WithResultPage(lookups: 3);
        var household = app.CreateClient();
        for (var i = 0; i < 3; i++)
            Assert.Equal(HttpStatusCode.NotFound, (await household.PostAsJsonAsync("/api/results", new { code = "7KQ4-M2XD-H", secret = $"AAAAA-AAAA{i}" })).StatusCode);
        var refused = await household.PostAsJsonAsync("/api/results", new { code = "7KQ4-M2XD-H", secret = "AAAAA-AAAA9" });
        Assert.Equal(HttpStatusCode.TooManyRequests, refused.StatusCode);
        Assert.True(refused.Headers.Contains("Retry-After"));
    }

    [Fact]
    public async Task Result_PageOff_LettersPrintNoSecretAndLookupsMatchNothing()
    {
        using var app = new CommunityLeadFactory();
        var coordinator = app.CreateClient(Roles.Coordinator);
        var (code, _) = await new RouteSetup(app, coordinator).LetterAsync();
        Assert.Null(app.WithDb(db => db.Kits.Single(k => k.Code == code).ResultSecretHash));
        Assert.DoesNotContain("OnlineLine\":\"", app.WithDb(db => db.Letters.Single(l => l.KitCode == code).ContentJson));
        var response = await app.CreateClient().PostAsJsonAsync("/api/results", new { code, secret = "AAAAA-AAAAA" });
        Assert.Equal(HttpStatusCode.NotFound, response.StatusCode);
    }
}
