using System.Net;
using System.Text.Json.Nodes;
using CommunityLead.Api.Auth;
using CommunityLead.Tests.Infrastructure;
using static CommunityLead.Tests.Infrastructure.Fixtures;

namespace CommunityLead.Tests.Features.Interpretation;

/// <summary>Walks a kit to the lab and posts its results, the way a coordinator and the lab would.</summary>
public sealed class ResultsFlow(CommunityLeadFactory app)
{
    public HttpClient Coordinator { get; } = app.CreateClient(Roles.Coordinator);
    public HttpClient Lab { get; } = app.CreateClient(Roles.Lab);

    /// <summary>A received water kit of a new household; <paramref name="household"/> edits the sign-up body.</summary>
    public async Task<string> ReceivedKitAsync(Action<JsonObject>? household = null, object? collection = null)
    {
        var code = await IssueKitAsync(Coordinator, await SignUpAsync(Coordinator, household));
        await PostAsync(Coordinator, $"/api/kits/{code}/collection", collection ?? GoodWaterCollection(), HttpStatusCode.OK);
        await PostAsync(Lab, $"/api/kits/{code}/receipt", new { receivedAt = "2026-04-04T11:00:00+00:00" }, HttpStatusCode.OK);
        return code;
    }

    /// <summary>Lead in the first-draw and flushed bottles; a calibration check at <paramref name="calibration"/> of 10.</summary>
    public Task<JsonObject> PostLeadAsync(string code, double firstDraw, double flushed, double calibration = 10.1) =>
        PostAsync(Lab, "/api/lab/batches", new
        {
            batchId = $"B-{Guid.NewGuid():N}"[..20], method = "EPA 200.8", analyzedAt = "2026-04-05T10:00:00+00:00",
            results = new object[]
            {
                new { kitCode = code, bottle = "first-draw", analyte = "lead", value = firstDraw, unit = "ug/L", mdl = 0.3, reportingLimit = 1.0 },
                new { kitCode = code, bottle = "flushed", analyte = "lead", value = flushed, unit = "ug/L", mdl = 0.3, reportingLimit = 1.0 },
            },
            qc = new[] { new { type = "calibration-check", analyte = "lead", expected = 10.0, measured = calibration, unit = "ug/L" } },
        }, HttpStatusCode.Created);

    public Task<JsonObject> InterpretationAsync(string code) => GetAsync(Coordinator, $"/api/kits/{code}/interpretation");
}
