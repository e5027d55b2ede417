using System.Net;
using System.Net.Http.Json;
using CommunityLead.Api.Auth;
using CommunityLead.Rules.Kits;
using CommunityLead.Tests.Infrastructure;
using Microsoft.EntityFrameworkCore;
using static CommunityLead.Tests.Infrastructure.Fixtures;

namespace CommunityLead.Tests.Auth;

/// <summary>
/// What every route of the app promises: who may call it, the status a permitted caller gets, and how to
/// build a fresh valid request for it. Valid requests matter: a route that forgot its policy then answers
/// 2xx to the wrong role instead of hiding behind a 400.
/// </summary>
public static class RouteTable
{
    public static readonly IReadOnlyDictionary<string, RouteExpectation> Expectations = new Dictionary<string, RouteExpectation>
    {
        ["GET /health"] = RouteExpectation.Open(HttpStatusCode.OK, _ => Send(HttpMethod.Get, "/health")),
        ["GET /api/calendar"] = RouteExpectation.Open(HttpStatusCode.OK, _ => Send(HttpMethod.Get, "/api/calendar")),
        ["* /health/live"] = RouteExpectation.Open(HttpStatusCode.OK, _ => Send(HttpMethod.Get, "/health/live")),
        ["* /health/ready"] = RouteExpectation.Open(HttpStatusCode.OK, _ => Send(HttpMethod.Get, "/health/ready")),

        // Areas: the coordinator (and admin) keep the list; the health department reads the codes its reports use.
        ["GET /api/areas/"] = Allow([Roles.Coordinator, Roles.Admin, Roles.Health], HttpStatusCode.OK, _ => Send(HttpMethod.Get, "/api/areas")),
        ["POST /api/areas/"] = Allow([Roles.Coordinator, Roles.Admin], HttpStatusCode.Created,
            _ => Send(HttpMethod.Post, "/api/areas", new { code = $"area-{Guid.NewGuid():N}"[..20], name = "Salt Marsh" })),
        ["PUT /api/areas/{code}"] = Allow([Roles.Coordinator, Roles.Admin], HttpStatusCode.OK,
            _ => Send(HttpMethod.Put, "/api/areas/north", new { name = "North Shore" })),

        ["GET /api/households/"] = Coordinator(HttpStatusCode.OK, _ => Send(HttpMethod.Get, "/api/households?search=Quennell")),
        ["POST /api/households/"] = Coordinator(HttpStatusCode.Created, _ => Send(HttpMethod.Post, "/api/households", Household())),
        ["GET /api/households/{id:guid}"] = Coordinator(HttpStatusCode.OK,
            async s => Send(HttpMethod.Get, $"/api/households/{await s.HouseholdAsync()}")),
        ["PUT /api/households/{id:guid}"] = Coordinator(HttpStatusCode.NoContent,
            async s => Send(HttpMethod.Put, $"/api/households/{await s.HouseholdAsync()}", Household(h => h["pregnant"] = true))),

        ["POST /api/kits/"] = Coordinator(HttpStatusCode.Created,
            async s => Send(HttpMethod.Post, "/api/kits", new { householdId = await s.HouseholdAsync(), kind = "water" })),
        ["GET /api/kits/"] = Coordinator(HttpStatusCode.OK, _ => Send(HttpMethod.Get, "/api/kits?state=issued&page=1")),
        ["GET /api/kits/labels"] = Coordinator(HttpStatusCode.OK,
            async s => Send(HttpMethod.Get, $"/api/kits/labels?codes={await s.KitAsync()}&stock=a4-21")),
        ["GET /api/kits/{code}"] = Allow([Roles.Coordinator, Roles.Lab], HttpStatusCode.OK,
            async s => Send(HttpMethod.Get, $"/api/kits/{await s.KitAsync()}")),
        ["POST /api/kits/{code}/collection"] = Coordinator(HttpStatusCode.OK,
            async s => Send(HttpMethod.Post, $"/api/kits/{await s.KitAsync()}/collection", GoodWaterCollection())),
        ["POST /api/kits/{code}/receipt"] = Allow([Roles.Coordinator, Roles.Lab], HttpStatusCode.OK,
            async s => Send(HttpMethod.Post, $"/api/kits/{await s.CollectedKitAsync()}/receipt", new { receivedAt = "2026-04-04T11:00:00+00:00" })),
        ["POST /api/kits/{code}/cancel"] = Coordinator(HttpStatusCode.OK,
            async s => Send(HttpMethod.Post, $"/api/kits/{await s.KitAsync()}/cancel", new { reason = "household moved away" })),
        ["POST /api/kits/{code}/lost"] = Coordinator(HttpStatusCode.OK,
            async s => Send(HttpMethod.Post, $"/api/kits/{await s.KitAsync()}/lost", new { reason = "never reached the house" })),
        ["POST /api/kits/{code}/reject"] = Coordinator(HttpStatusCode.OK,
            async s => Send(HttpMethod.Post, $"/api/kits/{await s.CollectedKitAsync()}/reject", new { reason = "bottle leaked in transit" })),
        ["POST /api/kits/{code}/replacement"] = Coordinator(HttpStatusCode.Created,
            async s => Send(HttpMethod.Post, $"/api/kits/{await s.KitAsync()}/replacement", new { reason = "label torn off" })),
        ["POST /api/kits/{code}/close"] = Coordinator(HttpStatusCode.OK,
            async s => Send(HttpMethod.Post, $"/api/kits/{await s.KitInStateAsync(KitState.LetterSent)}/close")),

        ["POST /api/lab/batches"] = Allow([Roles.Lab], HttpStatusCode.Created,
            async s => Send(HttpMethod.Post, "/api/lab/batches", await s.BatchBodyAsync(calibrationMeasured: 10.1))),
        ["GET /api/lab/batches"] = Allow([Roles.Coordinator, Roles.Lab], HttpStatusCode.OK, _ => Send(HttpMethod.Get, "/api/lab/batches")),
        ["GET /api/lab/batches/{batchId}"] = Allow([Roles.Coordinator, Roles.Lab], HttpStatusCode.OK,
            async s => Send(HttpMethod.Get, $"/api/lab/batches/{await s.BatchAsync(calibrationMeasured: 10.1)}")),
        ["GET /api/lab/batches/{batchId}/qc-report"] = Allow([Roles.Coordinator, Roles.Lab], HttpStatusCode.OK,
            async s => Send(HttpMethod.Get, $"/api/lab/batches/{await s.BatchAsync(calibrationMeasured: 10.1)}/qc-report")),
        // A calibration check 50% high fails QC, so the batch is held and waits for a coordinator.
        ["POST /api/lab/batches/{batchId}/release"] = Coordinator(HttpStatusCode.OK,
            async s => Send(HttpMethod.Post, $"/api/lab/batches/{await s.BatchAsync(calibrationMeasured: 15)}/release",
                new { reason = "lab re-ran the calibration and sent its log" })),
        ["POST /api/lab/mdl"] = Allow([Roles.Coordinator, Roles.Lab], HttpStatusCode.OK, _ => Send(HttpMethod.Post, "/api/lab/mdl",
            new { spiked = new[] { 1.1, 0.9, 1.0, 1.2, 0.95, 1.05, 1.0 } })),
        ["GET /api/attention/"] = Coordinator(HttpStatusCode.OK, _ => Send(HttpMethod.Get, "/api/attention")),
        ["GET /api/attention/kits"] = Coordinator(HttpStatusCode.OK, _ => Send(HttpMethod.Get, "/api/attention/kits")),
        ["POST /api/attention/{id:int}/resolve"] = Coordinator(HttpStatusCode.NoContent,
            async s => Send(HttpMethod.Post, $"/api/attention/{await s.AttentionItemAsync()}/resolve", new { note = "called; filter offered" })),

        ["GET /api/kits/{code}/letter"] = Coordinator(HttpStatusCode.OK,
            async s => Send(HttpMethod.Get, $"/api/kits/{await s.InterpretedKitAsync(firstDrawLead: 3.2)}/letter")),
        ["GET /api/kits/{code}/letter/words"] = Coordinator(HttpStatusCode.OK,
            async s => Send(HttpMethod.Get, $"/api/kits/{await s.InterpretedKitAsync(firstDrawLead: 3.2)}/letter/words")),
        ["POST /api/kits/{code}/letter/sent"] = Coordinator(HttpStatusCode.OK,
            async s => Send(HttpMethod.Post, $"/api/kits/{(await s.LetterAsync()).Code}/letter/sent", new { })),
        ["GET /api/kits/{code}/letters"] = Coordinator(HttpStatusCode.OK,
            async s => Send(HttpMethod.Get, $"/api/kits/{(await s.LetterAsync()).Code}/letters")),
        ["GET /api/letters/{id:int}"] = Coordinator(HttpStatusCode.OK,
            async s => Send(HttpMethod.Get, $"/api/letters/{(await s.LetterAsync()).Id}")),
        ["GET /api/letters/{id:int}/words"] = Coordinator(HttpStatusCode.OK,
            async s => Send(HttpMethod.Get, $"/api/letters/{(await s.LetterAsync()).Id}/words")),
        ["POST /api/letters/batch"] = Coordinator(HttpStatusCode.OK, _ => Send(HttpMethod.Post, "/api/letters/batch")),

        ["GET /api/kits/{code}/interpretation/"] = Coordinator(HttpStatusCode.OK,
            async s => Send(HttpMethod.Get, $"/api/kits/{await s.InterpretedKitAsync(firstDrawLead: 3.2)}/interpretation")),
        ["POST /api/kits/{code}/interpretation/"] = Coordinator(HttpStatusCode.OK,
            async s => Send(HttpMethod.Post, $"/api/kits/{await s.InterpretedKitAsync(firstDrawLead: 3.2)}/interpretation")),

        ["GET /api/reports/summary"] = Allow([Roles.Health], HttpStatusCode.OK, _ => Send(HttpMethod.Get, "/api/reports/summary?groupBy=area")),
        ["GET /api/reports/summary/chart"] = Allow([Roles.Health], HttpStatusCode.OK,
            _ => Send(HttpMethod.Get, "/api/reports/summary/chart?chart=lead-bands&groupBy=area")),

        // Open to anyone (a household has no key); with a made-up code and secret every caller gets the same 404.
        ["POST /api/results/"] = RouteExpectation.Open(HttpStatusCode.NotFound,
            _ => Send(HttpMethod.Post, "/api/results", new { code = "7KQ4-M2XD-H", secret = "AAAAA-AAAAA" })),
        ["POST /api/results/letter"] = RouteExpectation.Open(HttpStatusCode.NotFound,
            _ => Send(HttpMethod.Post, "/api/results/letter", new { code = "7KQ4-M2XD-H", secret = "AAAAA-AAAAA" })),

        ["GET /api/admin/keys"] = Allow([Roles.Admin], HttpStatusCode.OK, _ => Send(HttpMethod.Get, "/api/admin/keys")),
        ["* /api/admin/metrics"] = Allow([Roles.Admin], HttpStatusCode.OK, _ => Send(HttpMethod.Get, "/api/admin/metrics")),
        ["GET /api/admin/audit"] = Allow([Roles.Admin], HttpStatusCode.OK, _ => Send(HttpMethod.Get, "/api/admin/audit?pageSize=10")),
        ["GET /api/admin/messages"] = Allow([Roles.Admin], HttpStatusCode.OK, _ => Send(HttpMethod.Get, "/api/admin/messages?format=csv")),
    };

    private static RouteExpectation Coordinator(HttpStatusCode designed, Func<RouteSetup, Task<HttpRequestMessage>> prepare) =>
        Allow([Roles.Coordinator], designed, prepare);

    private static RouteExpectation Coordinator(HttpStatusCode designed, Func<RouteSetup, HttpRequestMessage> prepare) =>
        Allow([Roles.Coordinator], designed, s => Task.FromResult(prepare(s)));

    private static RouteExpectation Allow(string[] roles, HttpStatusCode designed, Func<RouteSetup, Task<HttpRequestMessage>> prepare) =>
        new(roles, designed, prepare);

    private static RouteExpectation Allow(string[] roles, HttpStatusCode designed, Func<RouteSetup, HttpRequestMessage> prepare) =>
        new(roles, designed, s => Task.FromResult(prepare(s)));

    public static HttpRequestMessage Send(HttpMethod method, string path, object? body = null) =>
        new(method, path) { Content = body is null ? null : JsonContent.Create(body) };
}

/// <summary><see cref="Allowed"/> is null for a route open without a key.</summary>
public sealed record RouteExpectation(string[]? Allowed, HttpStatusCode Designed, Func<RouteSetup, Task<HttpRequestMessage>> Prepare)
{
    public static RouteExpectation Open(HttpStatusCode designed, Func<RouteSetup, HttpRequestMessage> prepare) =>
        new(null, designed, s => Task.FromResult(prepare(s)));

    /// <summary>The status a caller with this role (null: no key) must get.</summary>
    public HttpStatusCode ExpectedFor(string? role) =>
        Allowed is null ? Designed
        : role is null ? HttpStatusCode.Unauthorized
        : Allowed.Contains(role) ? Designed
        : HttpStatusCode.Forbidden;
}

/// <summary>Makes the households, kits and batches a route needs, as a coordinator and the lab would.</summary>
public sealed class RouteSetup(CommunityLeadFactory app, HttpClient coordinator)
{
    private readonly HttpClient lab = app.CreateClient(Roles.Lab);

    public Task<string> HouseholdAsync() => SignUpAsync(coordinator);

    public Task<string> KitAsync() => IssueKitAsync(coordinator);

    public async Task<string> CollectedKitAsync()
    {
        var code = await KitAsync();
        await PostAsync(coordinator, $"/api/kits/{code}/collection", GoodWaterCollection(), HttpStatusCode.OK);
        return code;
    }

    /// <summary>A lab batch of one received kit's two bottles, with one lead calibration check.</summary>
    public async Task<object> BatchBodyAsync(double calibrationMeasured, double firstDrawLead = 3.2) =>
        (await BatchForNewKitAsync(calibrationMeasured, firstDrawLead)).Body;

    private async Task<(string Code, object Body)> BatchForNewKitAsync(double calibrationMeasured, double firstDrawLead)
    {
        var code = await CollectedKitAsync();
        await PostAsync(lab, $"/api/kits/{code}/receipt", new { receivedAt = "2026-04-04T11:00:00+00:00" }, HttpStatusCode.OK);
        object Result(string bottle, double value) =>
            new { kitCode = code, bottle, analyte = "lead", value, unit = "ug/L", mdl = 0.5, reportingLimit = 1.0 };
        return (code, new
        {
            batchId = $"B-{Guid.NewGuid():N}", method = "EPA 200.8", analyzedAt = "2026-04-05T10:00:00+00:00",
            results = new[] { Result("first-draw", firstDrawLead), Result("flushed", 1.4) },
            qc = new[] { new { type = "calibration-check", analyte = "lead", expected = 10.0, measured = calibrationMeasured, unit = "ug/L" } },
        });
    }

    /// <summary>A kit whose accepted results made it interpreted.</summary>
    public async Task<string> InterpretedKitAsync(double firstDrawLead)
    {
        var (code, body) = await BatchForNewKitAsync(calibrationMeasured: 10.1, firstDrawLead);
        await PostAsync(lab, "/api/lab/batches", body, HttpStatusCode.Created);
        return code;
    }

    /// <summary>A kit whose letter was rendered (issued), and that letter's id.</summary>
    public async Task<(string Code, int Id)> LetterAsync()
    {
        var code = await InterpretedKitAsync(firstDrawLead: 3.2);
        var response = await coordinator.GetAsync($"/api/kits/{code}/letter");
        await Expect(response, HttpStatusCode.OK);
        return (code, int.Parse(response.Headers.GetValues("X-Letter-Id").Single()));
    }

    /// <summary>An open attention item: a first draw at 25 µg/L is over the action level.</summary>
    public async Task<int> AttentionItemAsync()
    {
        var code = await InterpretedKitAsync(firstDrawLead: 25);
        return app.WithDb(db => db.Attention.First(a => a.KitCode == code && a.ResolvedAtUtc == null).Id);
    }

    public async Task<string> BatchAsync(double calibrationMeasured)
    {
        var posted = await PostAsync(lab, "/api/lab/batches", await BatchBodyAsync(calibrationMeasured), HttpStatusCode.Created);
        return posted["batchId"]!.GetValue<string>();
    }

    /// <summary>
    /// For states no route of this service reaches yet (results, letters): the kit is moved in the database.
    /// Once those routes exist, walking there through them would be better.
    /// </summary>
    public async Task<string> KitInStateAsync(KitState state)
    {
        var code = await KitAsync();
        var updated = app.WithDb(db => db.Kits.Where(k => k.Code == code).ExecuteUpdate(k => k.SetProperty(x => x.State, state)));
        Assert.Equal(1, updated);
        return code;
    }
}
