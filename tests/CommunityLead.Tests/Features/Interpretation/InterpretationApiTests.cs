using System.Diagnostics;
using System.Net;
using System.Net.Http.Json;
using System.Text.Json.Nodes;
using CommunityLead.Tests.Infrastructure;
using static CommunityLead.Tests.Infrastructure.Fixtures;

namespace CommunityLead.Tests.Features.Interpretation;

public class InterpretationApiTests
{
    private static string[] Strings(JsonNode? array, string? field = null) =>
        [.. array!.AsArray().Select(n => field is null ? n!.GetValue<string>() : n![field]!.GetValue<string>())];

    [Fact]
    public async Task Interpretation_ActionLevelInHomeWithYoungChild_StoredWithProfileAndServedInBothLanguages()
    {
        using var app = new CommunityLeadFactory();
        var flow = new ResultsFlow(app);
        var code = await flow.ReceivedKitAsync(h => h["childUnder6"] = true);
        // US LCRI action level 10 µg/L (89 FR 86418); 12.4 is above it, 3.1 after flushing is below.
        await flow.PostLeadAsync(code, firstDraw: 12.4, flushed: 3.1);

        var result = await flow.InterpretationAsync(code);
        Assert.Equal("action", result["band"]!.GetValue<string>());
        Assert.Equal("us-lcri", result["profile"]!["id"]!.GetValue<string>());
        Assert.Equal(1, result["profile"]!["version"]!.GetValue<int>());
        Assert.False(result["provisional"]!.GetValue<bool>());
        Assert.Equal("faucet-or-nearby-plumbing", result["pattern"]!.GetValue<string>());
        Assert.Contains("action-level-vulnerable-home", Strings(result["flags"]));
        Assert.All(result["messages"]!.AsArray(), m =>
        {
            Assert.False(string.IsNullOrWhiteSpace(m!["en"]!.GetValue<string>()));
            Assert.False(string.IsNullOrWhiteSpace(m["es"]!.GetValue<string>()));
        });
        var kit = await GetAsync(flow.Coordinator, $"/api/kits/{code}");
        Assert.Equal("interpreted", kit["state"]!.GetValue<string>());
        Assert.Contains("interpret", Strings(kit["history"], "action"));
    }

    [Fact]
    public async Task Attention_SeveralKits_MostUrgentFirst()
    {
        using var app = new CommunityLeadFactory();
        var flow = new ResultsFlow(app);
        var plainAction = await flow.ReceivedKitAsync(h => { h["childUnder6"] = false; h["serviceLine"] = "copper"; });
        await flow.PostLeadAsync(plainAction, firstDraw: 14, flushed: 2);
        var urgent = await flow.ReceivedKitAsync(h => h["childUnder6"] = false);
        await flow.PostLeadAsync(urgent, firstDraw: 65, flushed: 4);   // at or above the urgent setting (50 µg/L)
        var vulnerable = await flow.ReceivedKitAsync(h => { h["childUnder6"] = false; h["pregnant"] = true; h["serviceLine"] = "copper"; });
        await flow.PostLeadAsync(vulnerable, firstDraw: 14, flushed: 2);

        var list = (await flow.Coordinator.GetFromJsonAsyncArray("/api/attention"))
            .Select(a => (Kit: a!["kitCode"]!.GetValue<string>(), Reason: a["reason"]!.GetValue<string>())).ToList();
        Assert.Equal((urgent, "urgent"), list[0]);
        Assert.Equal((vulnerable, "action-level-vulnerable-home"), list[1]);
        Assert.Contains((plainAction, "action-level"), list);
        Assert.True(list.IndexOf((plainAction, "action-level")) > 1);
    }

    [Fact]
    public async Task Interpretation_ResultsHeldByQc_ProvisionalRetestAndKitNotMoved()
    {
        using var app = new CommunityLeadFactory();
        var flow = new ResultsFlow(app);
        var code = await flow.ReceivedKitAsync();
        var batch = await flow.PostLeadAsync(code, firstDraw: 4, flushed: 1.5, calibration: 7.5); // 75 % recovery fails 90–110 %
        Assert.Equal("held", batch["status"]!.GetValue<string>());

        var result = await flow.InterpretationAsync(code);
        Assert.True(result["provisional"]!.GetValue<bool>());
        Assert.Equal("retest", result["band"]!.GetValue<string>());
        Assert.Contains("qc-held", Strings(result["validity"], "code"));
        Assert.Equal("received", (await GetAsync(flow.Coordinator, $"/api/kits/{code}"))["state"]!.GetValue<string>());
    }

    [Fact]
    public async Task Interpretation_ShortStandingTime_RetestAndOnTheAttentionList()
    {
        using var app = new CommunityLeadFactory();
        var flow = new ResultsFlow(app);
        var shortStanding = new
        {
            samples = new object[]
            {
                new { bottle = "first-draw", volumeMl = 1000, collectedAt = "2026-04-03T06:00:00+00:00", waterLastUsedAt = "2026-04-03T02:00:00+00:00" },
                new { bottle = "flushed", volumeMl = 1000, collectedAt = "2026-04-03T06:05:00+00:00", flushSeconds = 120 },
            },
        };
        var code = await flow.ReceivedKitAsync(collection: shortStanding);
        await flow.PostLeadAsync(code, firstDraw: 3, flushed: 1.2);
        var result = await flow.InterpretationAsync(code);
        Assert.Equal("retest", result["band"]!.GetValue<string>());
        Assert.Contains("standing-time-short", Strings(result["validity"], "code"));
        var attention = await flow.Coordinator.GetFromJsonAsyncArray("/api/attention");
        Assert.Contains(attention, a => a!["kitCode"]!.GetValue<string>() == code && a["reason"]!.GetValue<string>() == "retest-needed");
    }

    [Fact]
    public async Task Interpretation_AskedAgain_SupersedesButKeepsTheEarlierOne()
    {
        using var app = new CommunityLeadFactory();
        var flow = new ResultsFlow(app);
        var code = await flow.ReceivedKitAsync();
        await flow.PostLeadAsync(code, firstDraw: 2.5, flushed: 1.1);
        await PostAsync(flow.Coordinator, $"/api/kits/{code}/interpretation", null, HttpStatusCode.OK);
        Assert.Equal(2, app.WithDb(db => db.Interpretations.Count(i => i.KitCode == code)));
        Assert.Equal(1, app.WithDb(db => db.Interpretations.Count(i => i.KitCode == code && i.SupersededAtUtc == null)));
    }

    [Fact]
    public async Task Interpretation_NoResultsYet_409WithState()
    {
        using var app = new CommunityLeadFactory();
        var flow = new ResultsFlow(app);
        var code = await IssueKitAsync(flow.Coordinator);
        var problem = await GetAsync(flow.Coordinator, $"/api/kits/{code}/interpretation", HttpStatusCode.Conflict);
        Assert.Equal("issued", problem["currentState"]!.GetValue<string>());
    }

    [Fact]
    public async Task Attention_Resolved_LeavesTheListWithItsNoteInTheHistory()
    {
        using var app = new CommunityLeadFactory();
        var flow = new ResultsFlow(app);
        var code = await flow.ReceivedKitAsync();
        await flow.PostLeadAsync(code, firstDraw: 22, flushed: 3);
        var item = (await flow.Coordinator.GetFromJsonAsyncArray("/api/attention")).First(a => a!["kitCode"]!.GetValue<string>() == code)!;
        var response = await flow.Coordinator.PostAsJsonAsync($"/api/attention/{item["id"]}/resolve", new { note = "Called; a certified filter was dropped off." });
        Assert.Equal(HttpStatusCode.NoContent, response.StatusCode);
        Assert.DoesNotContain(await flow.Coordinator.GetFromJsonAsyncArray("/api/attention"), a => a!["id"]!.GetValue<int>() == item["id"]!.GetValue<int>());
        var history = (await GetAsync(flow.Coordinator, $"/api/kits/{code}"))["history"]!.AsArray();
        Assert.Contains(history, h => h!["action"]!.GetValue<string>() == "resolve-attention" && h["reason"]!.GetValue<string>().Contains("filter"));
    }

    [Fact]
    public void Service_BrokenProfileFile_RefusesToStartNamingFileAndField()
    {
        var folder = Directory.CreateTempSubdirectory("cl-profiles").FullName;
        try
        {
            File.WriteAllText(Path.Combine(folder, "us-broken.json"), """
                { "id": "us-broken", "version": 1, "name": "Broken", "jurisdiction": "Test", "levels": [
                  { "analyte": "lead", "matrix": "water", "kind": "action-level", "value": 10, "unit": "mg/kg",
                    "meaning": "m", "source": "s", "marker": "published" } ] }
                """);
            var start = new ProcessStartInfo("dotnet", [typeof(Program).Assembly.Location, "migrate"])
            {
                RedirectStandardError = true, RedirectStandardOutput = true, UseShellExecute = false,
                Environment =
                {
                    ["Interpretation__ProfilesFolder"] = folder,
                    ["Interpretation__WaterProfile"] = "us-broken",
                    ["ConnectionStrings__CommunityLead"] = $"Data Source={Path.Combine(folder, "x.db")}",
                },
            };
            using var process = Process.Start(start)!;
            var error = process.StandardError.ReadToEnd();
            process.WaitForExit(60_000);
            Assert.Equal(1, process.ExitCode);
            Assert.Contains("us-broken.json", error);
            Assert.Contains("levels[0].unit", error);
        }
        finally
        {
            Directory.Delete(folder, recursive: true);
        }
    }
}

internal static class AttentionClient
{
    public static async Task<JsonArray> GetFromJsonAsyncArray(this HttpClient client, string path) =>
        JsonNode.Parse(await client.GetStringAsync(path))!.AsArray();
}

public class HeldResultsTests
{
    [Fact]
    public async Task Interpretation_HeldCopperThenAcceptedLead_StoredOneIgnoresTheHeldBatch()
    {
        using var app = new CommunityLeadFactory();
        var flow = new ResultsFlow(app);
        var code = await flow.ReceivedKitAsync();
        // A copper batch fails QC (calibration check at 70 %): held, kept out of interpretation and letters.
        var held = await PostAsync(flow.Lab, "/api/lab/batches", new
        {
            batchId = "CU-HELD-1", method = "EPA 200.8", analyzedAt = "2026-04-05T10:00:00+00:00",
            results = new[] { new { kitCode = code, bottle = "first-draw", analyte = "copper", value = 0.2, unit = "mg/L", mdl = 0.002, reportingLimit = 0.005 } },
            qc = new[] { new { type = "calibration-check", analyte = "copper", expected = 1.0, measured = 0.7, unit = "mg/L" } },
        }, HttpStatusCode.Created);
        Assert.Equal("held", held["status"]!.GetValue<string>());
        await flow.PostLeadAsync(code, firstDraw: 25, flushed: 3);

        var result = await flow.InterpretationAsync(code);
        Assert.False(result["provisional"]!.GetValue<bool>());
        Assert.Equal("action", result["band"]!.GetValue<string>());
        Assert.DoesNotContain(result["findings"]!.AsArray(), f => f!["analyte"]!.GetValue<string>() == "copper");
    }
}
