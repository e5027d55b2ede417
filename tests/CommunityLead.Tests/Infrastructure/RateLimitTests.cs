using System.Net;
using System.Net.Http.Json;
using CommunityLead.Api.Auth;
using CommunityLead.Tests.Features.LabResults;
using static CommunityLead.Tests.Infrastructure.BadInput;

namespace CommunityLead.Tests.Infrastructure;

/// <summary>Lab batches and letter batches are limited per key: past the limit, 429 with Retry-After and nothing done.</summary>
public class RateLimitTests
{
    [Fact]
    public async Task LabBatches_PastTheLimitPerKey_429WithRetryAfterAndNothingStored()
    {
        using var app = new CommunityLeadFactory { Settings = { ["RateLimits:LabBatchesPerKey"] = "2", ["RateLimits:Window"] = "00:30:00" } };
        var coordinator = app.CreateClient(Roles.Coordinator);
        var lab = app.CreateClient(Roles.Lab);
        var kit = await LabFixtures.ReceivedKitAsync(coordinator, lab);
        var batch = LabFixtures.Batch("RL-1", LabFixtures.BothBottles(kit));
        await LabFixtures.PostBatchAsync(lab, batch, HttpStatusCode.Created);
        await LabFixtures.PostBatchAsync(lab, batch, HttpStatusCode.OK); // the same batch again: answered, nothing new

        var refused = await lab.PostAsJsonAsync("/api/lab/batches", LabFixtures.Batch("RL-2", LabFixtures.BothBottles(kit)));

        var problem = await ExpectProblem(refused, HttpStatusCode.TooManyRequests);
        var seconds = RetryAfterSeconds(refused);
        Assert.InRange(seconds, 1, 30 * 60);
        Assert.Contains("at most 2 per 30 minutes", problem["detail"]!.GetValue<string>());
        Assert.Equal(1, app.WithDb(db => db.LabBatches.Count()));
        // Each key has its own allowance: another lab key is not held back.
        var otherLab = app.CreateClient(Roles.Lab);
        await LabFixtures.PostBatchAsync(otherLab, LabFixtures.Batch("RL-2", LabFixtures.BothBottles(kit)), HttpStatusCode.Created);
    }

    [Fact]
    public async Task LetterBatches_PastTheLimitPerKey_429WithRetryAfter()
    {
        using var app = new CommunityLeadFactory { Settings = { ["RateLimits:LetterBatchesPerKey"] = "1" } };
        var coordinator = app.CreateClient(Roles.Coordinator);
        Assert.Equal(HttpStatusCode.OK, (await coordinator.PostAsync("/api/letters/batch", null)).StatusCode);

        var refused = await coordinator.PostAsync("/api/letters/batch", null);

        var problem = await ExpectProblem(refused, HttpStatusCode.TooManyRequests);
        Assert.InRange(RetryAfterSeconds(refused), 1, 60); // the default window, one minute
        Assert.Contains("at most 1 per minute", problem["detail"]!.GetValue<string>());
        // Other routes of the same key are not limited.
        Assert.Equal(HttpStatusCode.OK, (await coordinator.GetAsync("/api/kits")).StatusCode);
    }

    [Fact]
    public async Task LabBatches_RefusedKey_UsesNoAllowance()
    {
        // The limiter runs after authorization: a coordinator key that may not post batches uses up nothing.
        using var app = new CommunityLeadFactory { Settings = { ["RateLimits:LabBatchesPerKey"] = "1" } };
        var coordinator = app.CreateClient(Roles.Coordinator);
        for (var i = 0; i < 3; i++)
            Assert.Equal(HttpStatusCode.Forbidden, (await coordinator.PostAsJsonAsync("/api/lab/batches", new { })).StatusCode);
        var lab = app.CreateClient(Roles.Lab);
        Assert.NotEqual(HttpStatusCode.TooManyRequests, (await lab.PostAsJsonAsync("/api/lab/batches", new { })).StatusCode);
        Assert.Equal(HttpStatusCode.TooManyRequests, (await lab.PostAsJsonAsync("/api/lab/batches", new { })).StatusCode);
    }

    private static int RetryAfterSeconds(HttpResponseMessage response) =>
        (int)Assert.IsType<TimeSpan>(response.Headers.RetryAfter?.Delta).TotalSeconds;
}
