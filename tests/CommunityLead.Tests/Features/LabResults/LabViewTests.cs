using System.Net;
using System.Net.Http.Json;
using System.Text.Json.Nodes;
using CommunityLead.Api.Auth;
using CommunityLead.Tests.Infrastructure;
using static CommunityLead.Tests.Features.LabResults.LabFixtures;
using static CommunityLead.Tests.Infrastructure.Fixtures;

namespace CommunityLead.Tests.Features.LabResults;

/// <summary>
/// What the lab must not see, on every answer it gets along the main path: the coordinator's tap note, the release
/// reason, the links between a household's kits, the household's id, and its name, address and phone.
/// </summary>
public class LabViewTests
{
    private const string TapNote = "behind Ottilie Varnham's bar, call 555 0166";
    private const string ReleaseReason = "Spoke with Ottilie Varnham: the lab re-ran its calibration";

    private static readonly string[] Forbidden =
    [
        "tapNote", "replacesCode", "replacedByCode", "householdId", TapNote, "Varnham", ReleaseReason,
        "Ottilie", "9 Saltpan Yard", "Gullet End", "555 0166", "ottilie@example.org", "00099",
    ];

    [Fact]
    public async Task LabAnswers_MainPath_CarryNoTapNoteReleaseReasonKitLinksHouseholdIdOrPersonalData()
    {
        using var app = new CommunityLeadFactory();
        var coordinator = app.CreateClient(Roles.Coordinator);
        var lab = app.CreateClient(Roles.Lab);
        var household = await SignUpAsync(coordinator, h =>
        {
            h["name"] = "Ottilie Varnham";
            h["address"] = new JsonObject { ["line1"] = "9 Saltpan Yard", ["city"] = "Gullet End", ["postalCode"] = "00099" };
            h["phone"] = "+1 555 0166";
            h["email"] = "ottilie@example.org";
        });
        // A replaced kit: the replacement carries replacesCode, the first one replacedByCode. Both handed out in March.
        var today = app.Clock.Now;
        app.Clock.Now = new DateTimeOffset(2026, 3, 2, 9, 0, 0, TimeSpan.Zero);
        var first = await IssueKitAsync(coordinator, household);
        var kit = (await PostAsync(coordinator, $"/api/kits/{first}/replacement", new { reason = "Ottilie Varnham lost the cap" },
            HttpStatusCode.Created))["code"]!.GetValue<string>();
        app.Clock.Now = today;
        await PostAsync(coordinator, $"/api/kits/{kit}/collection", new
        {
            samples = new object[]
            {
                new { bottle = "first-draw", volumeMl = 1000, collectedAt = "2026-04-03T06:00:00+00:00", waterLastUsedAt = "2026-04-02T22:00:00+00:00", tap = "other", tapNote = TapNote },
                new { bottle = "flushed", volumeMl = 1000, collectedAt = "2026-04-03T06:05:00+00:00", flushSeconds = 120, tap = "other", tapNote = TapNote },
            },
        }, HttpStatusCode.OK);

        var answers = new List<(string What, string Text)>();
        async Task Lab(string what, HttpResponseMessage response, HttpStatusCode expected)
        {
            await Expect(response, expected);
            answers.Add((what, await response.Content.ReadAsStringAsync()));
        }
        await Lab("receipt", await lab.PostAsJsonAsync($"/api/kits/{kit}/receipt", new { receivedAt = "2026-04-04T11:00:00+00:00" }), HttpStatusCode.OK);
        await Lab("kit", await lab.GetAsync($"/api/kits/{kit}"), HttpStatusCode.OK);
        await Lab("replaced kit", await lab.GetAsync($"/api/kits/{first}"), HttpStatusCode.OK);
        // A calibration check 50 % high holds the batch for the coordinator's decision.
        var batch = Batch("VIEW-1", BothBottles(kit), [Qc("calibration-blank", measured: 0.04), Qc("calibration-check", measured: 15, expected: 10)]);
        await Lab("held batch", await lab.PostAsJsonAsync("/api/lab/batches", batch), HttpStatusCode.Created);
        await PostAsync(coordinator, "/api/lab/batches/VIEW-1/release", new { reason = ReleaseReason }, HttpStatusCode.OK);
        await Lab("batch", await lab.GetAsync("/api/lab/batches/VIEW-1"), HttpStatusCode.OK);
        await Lab("batches", await lab.GetAsync("/api/lab/batches"), HttpStatusCode.OK);
        await Lab("released batches", await lab.GetAsync("/api/lab/batches?status=released"), HttpStatusCode.OK);
        await Lab("repeat", await lab.PostAsJsonAsync("/api/lab/batches", batch), HttpStatusCode.OK);
        await Lab("kit analyzed", await lab.GetAsync($"/api/kits/{kit}"), HttpStatusCode.OK);
        await Lab("mdl", await lab.PostAsJsonAsync("/api/lab/mdl", new { spiked = new[] { 1.1, 0.9, 1.0, 1.2, 0.95, 1.05, 1.0 } }), HttpStatusCode.OK);

        // The walk reached what it means to check: the kit's taps and the release are there, only without the words.
        var kitView = JsonNode.Parse(answers.Single(a => a.What == "kit").Text)!;
        Assert.Equal(["other", "other"], kitView["samples"]!.AsArray().Select(s => s!["tap"]!.GetValue<string>()));
        Assert.NotNull(JsonNode.Parse(answers.Single(a => a.What == "batch").Text)!["current"]!["release"]);
        foreach (var (what, text) in answers)
        {
            foreach (var word in Forbidden) Assert.False(text.Contains(word, StringComparison.OrdinalIgnoreCase), $"{what} carries '{word}': {text}");
            Assert.DoesNotContain(household, text, StringComparison.OrdinalIgnoreCase);
        }

        // The coordinator still sees all of it.
        var coordinatorView = await GetAsync(coordinator, $"/api/kits/{kit}");
        Assert.Equal(TapNote, coordinatorView["samples"]![0]!["tapNote"]!.GetValue<string>());
        Assert.Equal(first, coordinatorView["replacesCode"]!.GetValue<string>());
        Assert.Contains(ReleaseReason, (await GetAsync(coordinator, "/api/lab/batches/VIEW-1")).ToJsonString());
    }
}
