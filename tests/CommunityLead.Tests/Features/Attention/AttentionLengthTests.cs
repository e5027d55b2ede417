using System.Net;
using CommunityLead.Tests.Data;
using CommunityLead.Tests.Features.Interpretation;
using CommunityLead.Tests.Infrastructure;
using static CommunityLead.Tests.Features.LabResults.LabFixtures;
using static CommunityLead.Tests.Infrastructure.BadInput;
using static CommunityLead.Tests.Infrastructure.Fixtures;

namespace CommunityLead.Tests.Features.Attention;

/// <summary>A resolution note longer than its column is refused by name, with the limit, and the item stays open.</summary>
public class AttentionLengthTests
{
    [Fact]
    public async Task Attention_ResolveNoteOneCharacterOverItsColumn_400AndTheItemStaysOpen()
    {
        using var app = new CommunityLeadFactory();
        var flow = new ResultsFlow(app);
        await flow.PostLeadAsync(await flow.ReceivedKitAsync(), firstDraw: 22, flushed: 3);
        var open = await GetArrayAsync(flow.Coordinator, "/api/attention");
        var id = open[0]!["id"]!.GetValue<int>();
        var limit = StoreModel.MaxLength("AttentionItem.ResolutionNote");
        var audit = app.WithDb(db => db.AuditTrail.Count());

        var response = await SendJson(flow.Coordinator, HttpMethod.Post, $"/api/attention/{id}/resolve", Json(new { note = new string('n', limit + 1) }));

        var problem = await ExpectFieldError(response, "note");
        Assert.Contains($"{limit}", problem["errors"]!["note"]![0]!.GetValue<string>());
        Assert.Equal(audit, app.WithDb(db => db.AuditTrail.Count()));
        Assert.Equal(open.ToJsonString(), (await GetArrayAsync(flow.Coordinator, "/api/attention")).ToJsonString());

        var note = new string('n', limit);
        await PostAsync(flow.Coordinator, $"/api/attention/{id}/resolve", new { note }, HttpStatusCode.NoContent);
        Assert.Equal(note, app.WithDb(db => db.Attention.Single(a => a.Id == id).ResolutionNote));
    }
}
