using System.Net;
using System.Text.Json.Nodes;
using CommunityLead.Api.Auth;
using CommunityLead.Api.Commands;
using CommunityLead.Api.Features.Wording;
using CommunityLead.Rules.Interpretation;
using CommunityLead.Tests.Infrastructure;
using static CommunityLead.Tests.Infrastructure.Fixtures;

namespace CommunityLead.Tests.Features.Wording;

public class WordingEndpointTests
{
    [Fact]
    public async Task AdminMessages_Json_IsTheWholeCatalogueUnderItsVersion()
    {
        using var app = new CommunityLeadFactory();
        var body = await GetAsync(app.CreateClient(Roles.Admin), "/api/admin/messages");

        Assert.Equal(WordingCatalogue.Version, body["version"]!.GetValue<string>());
        Assert.Equal(MessageCatalog.Version, body["messagesVersion"]!.GetValue<string>());
        var entries = body["entries"]!.AsArray().Select(e => e!.AsObject()).ToList();
        Assert.Equal(WordingCatalogue.Export().Entries.Select(e => e.Code), entries.Select(e => e["code"]!.GetValue<string>()));
        var templates = MessageCatalog.All.ToDictionary(t => t.Code);
        Assert.All(entries.Where(e => templates.ContainsKey(e["code"]!.GetValue<string>())), e =>
        {
            var t = templates[e["code"]!.GetValue<string>()];
            Assert.Equal((t.En, t.Es), (e["en"]!.GetValue<string>(), e["es"]!.GetValue<string>()));
            Assert.Contains(e["marker"]!.GetValue<string>(), new[] { "published", "practice", "memory", "our-wording" });
            Assert.Contains(e["reading"]!["spanishBand"]!.GetValue<string>(), new[] { "normal", "fairly-easy", "very-easy" });
        });
        Assert.Equal(MessageCatalog.All.Count, entries.Count(e => e["origin"]!.GetValue<string>() == "MessageCatalog"));
    }

    [Fact]
    public async Task AdminMessages_Csv_ReadsBackToTheSameTextsAndIsWhatTheCommandWrites()
    {
        using var app = new CommunityLeadFactory();
        var response = await app.CreateClient(Roles.Admin).GetAsync("/api/admin/messages?format=csv");
        await Expect(response, HttpStatusCode.OK);
        Assert.Equal("text/csv", response.Content.Headers.ContentType!.MediaType);
        var csv = await response.Content.ReadAsStringAsync();

        var rows = CsvTable.Read(csv);
        var export = WordingCatalogue.Export();
        Assert.Equal(export.Entries.Select(e => (e.Code, e.En, e.Es)), rows.Select(r => (r["code"], r["en"], r["es"])));
        Assert.All(rows, r => Assert.Equal(WordingCatalogue.Version, r["catalogueVersion"]));

        using var output = new StringWriter();
        using var error = new StringWriter();
        Assert.Equal(0, await CommandLine.RunAsync(["messages", "export", "--format", "csv"], app.Services, output, error));
        Assert.Equal(csv, output.ToString());
    }

    [Fact]
    public async Task AdminMessages_UnknownFormat_400NamingTheField()
    {
        using var app = new CommunityLeadFactory();
        var problem = await GetAsync(app.CreateClient(Roles.Admin), "/api/admin/messages?format=xlsx", HttpStatusCode.BadRequest);
        Assert.Equal("Use json or csv.", problem["errors"]!["format"]![0]!.GetValue<string>());
    }

    [Fact]
    public async Task AdminMessages_CoordinatorOrLab_Forbidden_NoKey_Unauthorized()
    {
        using var app = new CommunityLeadFactory();
        Assert.Equal(HttpStatusCode.Forbidden, (await app.CreateClient(Roles.Coordinator).GetAsync("/api/admin/messages")).StatusCode);
        Assert.Equal(HttpStatusCode.Forbidden, (await app.CreateClient(Roles.Lab).GetAsync("/api/admin/messages")).StatusCode);
        Assert.Equal(HttpStatusCode.Unauthorized, (await app.CreateClient().GetAsync("/api/admin/messages")).StatusCode);
    }
}
