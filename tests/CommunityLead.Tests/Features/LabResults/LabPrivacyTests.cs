using System.Net;
using CommunityLead.Api.Auth;
using CommunityLead.Tests.Infrastructure;
using static CommunityLead.Tests.Features.LabResults.LabFixtures;
using static CommunityLead.Tests.Infrastructure.Fixtures;

namespace CommunityLead.Tests.Features.LabResults;

/// <summary>The lab works with kit codes only: nothing it reads back names or locates a household.</summary>
public class LabPrivacyTests
{
    // The household of Fixtures.Household: every personal value it holds.
    private static readonly string[] Personal =
        ["Marisol", "Quennell", "Larkspur", "Fennick", "555 0114", "marisol@example.org", "00014"];

    [Fact]
    public async Task LabViews_OfABatch_ContainNoHouseholdData()
    {
        using var app = new CommunityLeadFactory();
        var coordinator = app.CreateClient(Roles.Coordinator);
        var lab = app.CreateClient(Roles.Lab);
        var kit = await ReceivedKitAsync(coordinator, lab);
        var householdId = (await GetAsync(coordinator, $"/api/kits/{kit}"))["householdId"]!.GetValue<string>();
        var batch = Batch("PRIV-1", BothBottles(kit), analyzedAt: "2026-04-20T10:00:00+00:00");
        batch["results"]![0]!["acidifiedAt"] = "2026-04-18T07:00:00+00:00";
        app.Clock.Now = new DateTimeOffset(2026, 4, 25, 12, 0, 0, TimeSpan.Zero);

        var texts = new List<string>
        {
            (await PostBatchAsync(lab, batch, HttpStatusCode.Created)).ToJsonString(),
            (await PostBatchAsync(lab, batch, HttpStatusCode.OK)).ToJsonString(),
            (await GetAsync(lab, "/api/lab/batches/PRIV-1")).ToJsonString(),
            (await GetAsync(lab, "/api/lab/batches")).ToJsonString(),
        };
        batch["results"]![1]!["value"] = 3.3;
        texts.Add((await PostBatchAsync(lab, batch, HttpStatusCode.Conflict)).ToJsonString());
        batch["batchId"] = "PRIV-2";
        batch["results"]![1]!["value"] = -1;
        texts.Add((await PostBatchAsync(lab, batch, HttpStatusCode.UnprocessableEntity)).ToJsonString());

        Assert.Contains(kit, texts[0], StringComparison.Ordinal);
        Assert.Contains("acidified-late", texts[0], StringComparison.Ordinal);
        foreach (var text in texts)
        {
            foreach (var value in Personal) Assert.DoesNotContain(value, text, StringComparison.OrdinalIgnoreCase);
            Assert.DoesNotContain(householdId, text, StringComparison.OrdinalIgnoreCase);
        }
    }
}
