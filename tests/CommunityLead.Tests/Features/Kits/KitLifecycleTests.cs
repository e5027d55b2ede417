using System.Net;
using CommunityLead.Api.Auth;
using CommunityLead.Tests.Infrastructure;
using static CommunityLead.Tests.Infrastructure.Fixtures;

namespace CommunityLead.Tests.Features.Kits;

public class KitLifecycleTests
{
    [Fact]
    public async Task Kit_IssueCollectReceive_HistoryShowsEveryStepWithWhoAndWhen()
    {
        using var app = new CommunityLeadFactory();
        var coordinator = app.CreateClient(Roles.Coordinator);
        var lab = app.CreateClient(Roles.Lab);
        var code = await IssueKitAsync(coordinator);

        var collected = await PostAsync(coordinator, $"/api/kits/{code}/collection", GoodWaterCollection(), HttpStatusCode.OK);
        Assert.Equal("collected", collected["state"]!.GetValue<string>());
        Assert.Empty(collected["flags"]!.AsArray());
        Assert.Equal(480, collected["samples"]![0]!["standingMinutes"]!.GetValue<int>());

        var received = await PostAsync(lab, $"/api/kits/{code}/receipt", new { receivedAt = "2026-04-04T11:00:00+00:00" }, HttpStatusCode.OK);
        Assert.Equal("received", received["state"]!.GetValue<string>());

        var kit = await GetAsync(coordinator, $"/api/kits/{code}");
        var history = kit["history"]!.AsArray();
        Assert.Equal(["issue", "record-collection", "receive"], history.Select(h => h!["action"]!.GetValue<string>()));
        Assert.Equal("received", history[2]!["to"]!.GetValue<string>());
        Assert.Equal("lab", history[2]!["role"]!.GetValue<string>());
        Assert.StartsWith("lab-", history[2]!["actor"]!.GetValue<string>());
    }
}
