using System.Net;
using System.Text.Json.Nodes;
using CommunityLead.Api.Auth;
using CommunityLead.Tests.Infrastructure;
using static CommunityLead.Tests.Features.LabResults.LabFixtures;
using static CommunityLead.Tests.Infrastructure.Fixtures;

namespace CommunityLead.Tests.Features.LabResults;

/// <summary>Results handled too late are kept and flagged, never refused (DOMAIN.md §3).</summary>
public class HoldingTimeTests
{
    [Fact]
    public async Task Batch_AnalyzedMoreThanSixMonthsAfterCollection_AcceptedAndFlagged()
    {
        using var app = new CommunityLeadFactory();
        var coordinator = app.CreateClient(Roles.Coordinator);
        var lab = app.CreateClient(Roles.Lab);
        var kit = await ReceivedKitAsync(coordinator, lab);
        // Collected 2026-04-03T06:00Z; 6 months later is 2026-10-03T06:00Z [published: 40 CFR 141.23(k)(2)].
        app.Clock.Now = new DateTimeOffset(2026, 10, 20, 12, 0, 0, TimeSpan.Zero);

        var outcome = await PostBatchAsync(lab, Batch("LATE-1", BothBottles(kit), analyzedAt: "2026-10-03T09:00:00+00:00"),
            HttpStatusCode.Created);

        Assert.Equal("accepted", outcome["status"]!.GetValue<string>());
        var flags = outcome["flags"]!.AsArray().Select(f => f!.AsObject()).ToList();
        // Both bottles were collected more than 6 months earlier: the first draw at 06:00, the flushed bottle at 06:05.
        Assert.Equal(["first-draw", "flushed"], flags.Select(f => f["bottle"]!.GetValue<string>()).Order());
        Assert.All(flags, f =>
        {
            Assert.Equal("analyzed-after-holding-time", f["code"]!.GetValue<string>());
            Assert.Equal(kit, f["kitCode"]!.GetValue<string>());
        });
        var results = (await GetAsync(lab, "/api/lab/batches/LATE-1"))["results"]!.AsArray();
        Assert.All(results, r => Assert.Equal(["analyzed-after-holding-time"], Codes(r!["holdingFlags"]!)));
        await AssertAnalyzedAsync(coordinator, kit);
    }

    [Fact]
    public async Task Batch_AnalyzedJustInsideSixMonths_NotFlagged()
    {
        using var app = new CommunityLeadFactory();
        var coordinator = app.CreateClient(Roles.Coordinator);
        var lab = app.CreateClient(Roles.Lab);
        var kit = await ReceivedKitAsync(coordinator, lab);
        app.Clock.Now = new DateTimeOffset(2026, 10, 20, 12, 0, 0, TimeSpan.Zero);

        var outcome = await PostBatchAsync(lab, Batch("ONTIME-1", BothBottles(kit), analyzedAt: "2026-10-03T05:59:00+00:00"),
            HttpStatusCode.Created);

        Assert.Empty(outcome["flags"]!.AsArray());
    }

    [Fact]
    public async Task Batch_AcidifiedMoreThan14DaysAfterCollection_AcceptedAndFlaggedAcidifiedLate()
    {
        using var app = new CommunityLeadFactory();
        var coordinator = app.CreateClient(Roles.Coordinator);
        var lab = app.CreateClient(Roles.Lab);
        var kit = await ReceivedKitAsync(coordinator, lab);
        app.Clock.Now = new DateTimeOffset(2026, 4, 25, 12, 0, 0, TimeSpan.Zero);
        var results = BothBottles(kit);
        // First draw collected 2026-04-03T06:00Z: acid 15 days 1 h later, over the 14 days [published: 40 CFR 141.86(b)(2)].
        results[0]["acidifiedAt"] = "2026-04-18T07:00:00+00:00";
        // Flushed bottle collected 06:05Z: acid 13 days later, in time.
        results[1]["acidifiedAt"] = "2026-04-16T06:05:00+00:00";

        var outcome = await PostBatchAsync(lab, Batch("ACID-1", results, analyzedAt: "2026-04-20T10:00:00+00:00"), HttpStatusCode.Created);

        Assert.Equal("accepted", outcome["status"]!.GetValue<string>());
        var flag = Assert.Single(outcome["flags"]!.AsArray())!;
        Assert.Equal(("first-draw", "acidified-late"), (flag["bottle"]!.GetValue<string>(), flag["code"]!.GetValue<string>()));
        Assert.Contains("15 days", flag["message"]!.GetValue<string>(), StringComparison.Ordinal);
        var stored = app.WithDb(db => db.LabResults.OrderBy(r => r.Id).Select(r => r.HoldingFlags).ToList());
        Assert.Contains("acidified-late", stored[0], StringComparison.Ordinal);
        Assert.Null(stored[1]);
    }

    private static IEnumerable<string> Codes(JsonNode flags) => flags.AsArray().Select(f => f!.GetValue<string>());
}
