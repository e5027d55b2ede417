using System.Net;
using System.Net.Http.Headers;
using System.Text;
using System.Text.Json.Nodes;
using CommunityLead.Api.Auth;
using CommunityLead.Tests.Infrastructure;
using Microsoft.AspNetCore.Hosting;
using static CommunityLead.Tests.Features.LabResults.LabFixtures;
using static CommunityLead.Tests.Infrastructure.Fixtures;

namespace CommunityLead.Tests.Features.LabResults;

/// <summary>What happens before any row is looked at: the body's syntax, type and size.</summary>
public class BatchTransportTests
{
    [Fact]
    public async Task JsonBatch_Malformed_400AndNothingWritten()
    {
        using var app = new CommunityLeadFactory();
        var lab = app.CreateClient(Roles.Lab);
        var before = FootprintOf(app);

        var response = await lab.PostAsync("/api/lab/batches",
            new StringContent("""{ "batchId": "BAD-JSON", "results": [ { "kitCode": "X" """, Encoding.UTF8, "application/json"));

        var problem = await ReadAsync(response, HttpStatusCode.BadRequest);
        Assert.Equal("application/problem+json", response.Content.Headers.ContentType?.MediaType);
        Assert.NotNull(problem["errors"]);
        Assert.Equal(before, FootprintOf(app));
    }

    [Fact]
    public async Task JsonBatch_MisspeltField_400NamingIt()
    {
        using var app = new CommunityLeadFactory();
        var lab = app.CreateClient(Roles.Lab);

        var response = await lab.PostAsync("/api/lab/batches",
            new StringContent("""{ "batchId": "B", "method": "EPA 200.8", "analysedAt": "2026-04-08T14:30:00Z", "results": [] }""",
                Encoding.UTF8, "application/json"));

        var problem = await ReadAsync(response, HttpStatusCode.BadRequest);
        Assert.Contains("analysedAt", problem["errors"]!.AsObject().Select(e => e.Key).Single(), StringComparison.Ordinal);
    }

    [Fact]
    public async Task Batch_PlainText_415()
    {
        using var app = new CommunityLeadFactory();
        var lab = app.CreateClient(Roles.Lab);

        var response = await lab.PostAsync("/api/lab/batches", new StringContent("kitCode,value\n", Encoding.UTF8, "text/plain"));

        await Expect(response, HttpStatusCode.UnsupportedMediaType);
        Assert.Equal(0, app.WithDb(db => db.LabBatches.Count()));
    }

    [Theory]
    [InlineData("application/json", true)]
    [InlineData("application/json", false)]
    [InlineData("text/csv", true)]
    [InlineData("text/csv", false)]
    public async Task Batch_OverTheSizeLimit_413WithOrWithoutContentLength(string mediaType, bool withLength)
    {
        using var app = new CommunityLeadFactory();
        using var limited = app.WithWebHostBuilder(b => b.UseSetting("LabIntake:MaxBatchBytes", "2000"));
        var coordinator = limited.CreateClient();
        coordinator.DefaultRequestHeaders.Authorization = new AuthenticationHeaderValue("Bearer", app.CreateKey(Roles.Coordinator));
        var lab = limited.CreateClient();
        lab.DefaultRequestHeaders.Authorization = new AuthenticationHeaderValue("Bearer", app.CreateKey(Roles.Lab));
        var kit = await ReceivedKitAsync(coordinator, lab);
        var before = FootprintOf(app);
        // The same rows, many times over: well-formed, so only the size can be the reason.
        var rows = string.Concat(Enumerable.Repeat($"{kit},first-draw,lead,12.4,ug/L,0.3,1.0\n", 60));
        var body = mediaType == "text/csv"
            ? "kitCode,bottle,analyte,value,unit,mdl,reportingLimit\n" + rows
            : Batch("BIG-1", [.. Enumerable.Range(0, 30).Select(_ => Result(kit, "first-draw", 12.4))]).ToJsonString();
        Assert.True(Encoding.UTF8.GetByteCount(body) > 2000);

        var response = await lab.PostAsync($"/api/lab/batches?{Query("BIG-1")}", Content(body, mediaType, withLength));

        await Expect(response, HttpStatusCode.RequestEntityTooLarge);
        Assert.Equal(before, FootprintOf(app));

        // Under the limit the same service takes a batch, so the limit is what refused the one above.
        var small = Batch("SMALL-1", BothBottles(kit)).ToJsonString();
        Assert.True(Encoding.UTF8.GetByteCount(small) < 2000);
        await Expect(await lab.PostAsync("/api/lab/batches", Content(small, "application/json", withLength)), HttpStatusCode.Created);
    }

    [Theory]
    [InlineData(true)]
    [InlineData(false)]
    public async Task Batch_LargerThanKestrelsOwnLimit_TheLabIntakeSettingDecides(bool withLength)
    {
        using var app = new CommunityLeadFactory();
        // On a real server Kestrel has a body limit of its own (30 MB by default), under LabIntake's 50 MB.
        app.UseKestrel(o => o.Limits.MaxRequestBodySize = 1_000);
        app.StartServer();
        var coordinator = app.CreateClient(Roles.Coordinator);
        var lab = app.CreateClient(Roles.Lab);
        var kit = await ReceivedKitAsync(coordinator, lab);
        var batch = Batch("KESTREL-1", BothBottles(kit));
        // Twenty replicate readings per result make a valid batch of more than 1,000 bytes.
        foreach (var result in batch["results"]!.AsArray())
            result!["replicates"] = new JsonArray([.. Enumerable.Range(0, 20).Select(i => JsonValue.Create(12.0 + i / 7.0))]);
        var body = batch.ToJsonString();
        Assert.True(Encoding.UTF8.GetByteCount(body) > 1_000);

        var response = await lab.PostAsync("/api/lab/batches", Content(body, "application/json", withLength));

        await Expect(response, HttpStatusCode.Created);
    }

    private static HttpContent Content(string body, string mediaType, bool withLength)
    {
        var bytes = Encoding.UTF8.GetBytes(body);
        HttpContent content = withLength ? new ByteArrayContent(bytes) : new UnknownLengthContent(bytes, mediaType);
        content.Headers.ContentType = new MediaTypeHeaderValue(mediaType);
        Assert.Equal(withLength ? bytes.Length : null, content.Headers.ContentLength);
        return content;
    }
}
