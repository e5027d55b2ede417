using System.Net;
using System.Text.Json.Nodes;
using CommunityLead.Api.Auth;
using CommunityLead.Tests.Infrastructure;
using static CommunityLead.Tests.Infrastructure.Fixtures;

namespace CommunityLead.Tests.Features.Kits;

/// <summary>Flags go through the whole stack: recorded, stored, shown on the kit, and never drop data.</summary>
public class CollectionFlagTests
{
    private static object FirstDrawAndFlush(string lastUsed, string collected, string flushed) => new
    {
        samples = new object[]
        {
            new { bottle = "first-draw", volumeMl = 1000, collectedAt = collected, waterLastUsedAt = lastUsed, tap = "bathroom" },
            new { bottle = "flushed", volumeMl = 1000, collectedAt = flushed, flushSeconds = 90 },
        },
    };

    private static string[] FlagCodes(JsonObject kit) => [.. kit["flags"]!.AsArray().Select(f => f!["code"]!.GetValue<string>())];

    [Fact]
    public async Task Collection_SpringForwardNight_StandingTimeIsRealElapsedTime()
    {
        // US Eastern clocks jumped from 02:00 EST to 03:00 EDT on 2026-03-08 (IANA tz database, America/New_York):
        // 23:00 EST to 06:00 EDT is 7 h on the wall clock but only 6 h of standing water: still at least 6 h.
        using var app = new CommunityLeadFactory();
        var coordinator = app.CreateClient(Roles.Coordinator);
        var code = await IssueKitAsync(coordinator);
        var kit = await PostAsync(coordinator, $"/api/kits/{code}/collection",
            FirstDrawAndFlush("2026-03-07T23:00:00-05:00", "2026-03-08T06:00:00-04:00", "2026-03-08T06:03:00-04:00"), HttpStatusCode.OK);
        Assert.Equal(360, kit["samples"]![0]!["standingMinutes"]!.GetValue<int>());
        Assert.Empty(FlagCodes(kit));
        // The household's own offset is kept as written.
        Assert.Equal("2026-03-08T06:00:00-04:00", kit["samples"]![0]!["collectedAt"]!.GetValue<string>());
    }

    [Fact]
    public async Task Collection_SpringForwardNight_WallClockSixHoursIsReallyFiveAndFlagged()
    {
        // 00:30 EST to 06:30 EDT reads as 6 h on the kitchen clock but the water stood 5 h (IANA tz database).
        using var app = new CommunityLeadFactory();
        var coordinator = app.CreateClient(Roles.Coordinator);
        var code = await IssueKitAsync(coordinator);
        var kit = await PostAsync(coordinator, $"/api/kits/{code}/collection",
            FirstDrawAndFlush("2026-03-08T00:30:00-05:00", "2026-03-08T06:30:00-04:00", "2026-03-08T06:33:00-04:00"), HttpStatusCode.OK);
        Assert.Equal(300, kit["samples"]![0]!["standingMinutes"]!.GetValue<int>());
        Assert.Equal(["standing-time-short"], FlagCodes(kit));
        Assert.Equal("invalidates-sample", kit["flags"]![0]!["severity"]!.GetValue<string>());
        Assert.Equal("first-draw", kit["flags"]![0]!["bottle"]!.GetValue<string>());
    }

    [Fact]
    public async Task Collection_FlushedFirstAndInTheFuture_FlagsShownAndEveryBottleKept()
    {
        using var app = new CommunityLeadFactory(); // clock: 2026-04-10T12:00Z
        var coordinator = app.CreateClient(Roles.Coordinator);
        var code = await IssueKitAsync(coordinator);
        var kit = await PostAsync(coordinator, $"/api/kits/{code}/collection",
            FirstDrawAndFlush("2026-04-10T22:00:00+00:00", "2026-04-11T06:00:00+00:00", "2026-04-11T05:55:00+00:00"), HttpStatusCode.OK);
        Assert.Contains("flushed-before-first-draw", FlagCodes(kit));
        Assert.Contains("collected-in-future", FlagCodes(kit));
        Assert.Equal(2, kit["samples"]!.AsArray().Count);
        Assert.Equal("collected", kit["state"]!.GetValue<string>());
    }

    [Fact]
    public async Task Collection_RecordedAgain_SupersedesButKeepsTheFirstRecording()
    {
        using var app = new CommunityLeadFactory();
        var coordinator = app.CreateClient(Roles.Coordinator);
        var code = await IssueKitAsync(coordinator);
        await PostAsync(coordinator, $"/api/kits/{code}/collection",
            FirstDrawAndFlush("2026-04-03T04:00:00+00:00", "2026-04-03T06:00:00+00:00", "2026-04-03T06:05:00+00:00"), HttpStatusCode.OK);
        var corrected = await PostAsync(coordinator, $"/api/kits/{code}/collection", GoodWaterCollection(), HttpStatusCode.OK);

        Assert.Empty(FlagCodes(corrected));
        Assert.Equal(2, app.WithDb(db => db.Collections.Count()));
        Assert.Equal(4, app.WithDb(db => db.Samples.Count()));
        Assert.Equal(1, app.WithDb(db => db.Collections.Count(c => c.SupersededAtUtc == null)));
        var actions = corrected["history"]!.AsArray().Select(h => h!["action"]!.GetValue<string>());
        Assert.Equal(["issue", "record-collection", "record-collection"], actions);
    }

    [Fact]
    public async Task Collection_SequentialKit_LaterBottlesShareTheFirstBottlesStandingTime()
    {
        using var app = new CommunityLeadFactory();
        var coordinator = app.CreateClient(Roles.Coordinator);
        var code = await IssueKitAsync(coordinator, kind: "water-sequential");
        var samples = Enumerable.Range(1, 4).Select(p => new
        {
            bottle = "sequential", position = p, volumeMl = 250,
            collectedAt = $"2026-04-03T06:0{p}:00-05:00",
            waterLastUsedAt = p == 1 ? "2026-04-02T23:00:00-05:00" : null,
        });
        var kit = await PostAsync(coordinator, $"/api/kits/{code}/collection", new { samples }, HttpStatusCode.OK);
        Assert.Equal([421, 422, 423, 424], kit["samples"]!.AsArray().Select(s => s!["standingMinutes"]!.GetValue<int>()));
        Assert.Empty(FlagCodes(kit));
    }
}
