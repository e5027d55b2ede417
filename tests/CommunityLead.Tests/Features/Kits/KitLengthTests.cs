using System.Net;
using System.Text.Json;
using CommunityLead.Api.Auth;
using CommunityLead.Tests.Data;
using CommunityLead.Tests.Infrastructure;
using static CommunityLead.Tests.Infrastructure.BadInput;
using static CommunityLead.Tests.Infrastructure.Fixtures;

namespace CommunityLead.Tests.Features.Kits;

/// <summary>
/// Reasons, notes and tap notes against their columns: one character more is refused by name, with the limit, and the
/// kit stays as it was; at the limit the text is stored whole (PostgreSQL would refuse a longer one with a 500).
/// </summary>
public class KitLengthTests
{
    private static readonly int Reason = StoreModel.MaxLength("Kit.StateReason");

    /// <summary>ReceiptValidator's limit: the note goes into the audit detail, whose other half holds the summary.</summary>
    private static readonly int Note = StoreModel.MaxLength("AuditEntry.Detail") / 2;

    /// <summary>(move, its JSON body with {0} for the text, field named, longest text allowed)</summary>
    public static readonly TheoryData<string, string, string, int> Texts = new()
    {
        { "cancel", """{"reason":{0}}""", "reason", Reason },
        { "lost", """{"reason":{0}}""", "reason", Reason },
        { "reject", """{"reason":{0}}""", "reason", Reason },
        { "replacement", """{"reason":{0}}""", "reason", Reason },
        { "receipt", """{"receivedAt":"2026-04-04T11:00:00+00:00","note":{0}}""", "note", Note },
        { "collection", """{"samples":[{"bottle":"first-draw","volumeMl":1000,"collectedAt":"2026-04-03T06:00:00+00:00","tap":"other","tapNote":{0}}]}""",
            "samples[0].tapNote", StoreModel.MaxLength("Sample.TapNote") },
    };

    [Theory]
    [MemberData(nameof(Texts))]
    public async Task Kit_TextOneCharacterOverItsColumn_Is400SayingTheLimitAndLeavesTheKitAsItWas(
        string move, string body, string field, int limit)
    {
        using var app = new CommunityLeadFactory();
        var coordinator = app.CreateClient(Roles.Coordinator);
        var code = await IssueKitAsync(coordinator);
        var kit = await GetAsync(coordinator, $"/api/kits/{code}");
        var before = Rows.Count(app);

        var text = body.Replace("{0}", JsonSerializer.Serialize(new string('r', limit + 1)));
        var problem = await ExpectFieldError(await SendRaw(coordinator, HttpMethod.Post, $"/api/kits/{code}/{move}", text, "application/json"), field);

        Assert.Contains($"{limit}", problem["errors"]![field]![0]!.GetValue<string>());
        Assert.Equal(before, Rows.Count(app));
        Assert.Equal(kit.ToJsonString(), (await GetAsync(coordinator, $"/api/kits/{code}")).ToJsonString());
    }

    [Fact]
    public async Task Kit_TextsAtTheirColumnLength_AreStoredWhole()
    {
        using var app = new CommunityLeadFactory();
        var coordinator = app.CreateClient(Roles.Coordinator);
        var reason = new string('r', Reason);
        var note = new string('n', Note);
        var tapNote = new string('t', StoreModel.MaxLength("Sample.TapNote"));
        var code = await IssueKitAsync(coordinator);
        var collection = Json(GoodWaterCollection());
        With(collection, "samples[0].tapNote", JsonSerializer.Serialize(tapNote));

        await PostAsync(coordinator, $"/api/kits/{code}/collection", collection, HttpStatusCode.OK);
        await PostAsync(coordinator, $"/api/kits/{code}/receipt", new { receivedAt = "2026-04-04T11:00:00+00:00", note }, HttpStatusCode.OK);
        var rejected = await PostAsync(coordinator, $"/api/kits/{code}/reject", new { reason }, HttpStatusCode.OK);

        Assert.Equal(tapNote, rejected["samples"]![0]!["tapNote"]!.GetValue<string>());
        Assert.Equal(reason, app.WithDb(db => db.Kits.Single(k => k.Code == code).StateReason));
        Assert.Equal(note, app.WithDb(db => db.AuditTrail.Single(a => a.Action == "receive").Detail));
    }
}
