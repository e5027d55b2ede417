using System.Net;
using System.Text.Json.Nodes;
using CommunityLead.Api.Auth;
using CommunityLead.Rules.Interpretation;
using CommunityLead.Rules.Reports;
using CommunityLead.Tests.Infrastructure;
using CommunityLead.Tests.Rules.Reports;
using Microsoft.AspNetCore.Hosting;
using static CommunityLead.Tests.Features.Reports.ReportSeed;
using static CommunityLead.Tests.Infrastructure.Fixtures;

namespace CommunityLead.Tests.Features.Reports;

public class SummaryReportTests
{
    private static readonly string[] BandKeys = ["notDetected", "low", "advisory", "action", "urgent", "retest"];

    private static IEnumerable<SeedKit> Many(string area, Band band, int count, double lead) =>
        Enumerable.Range(0, count).Select(_ => new SeedKit(area, band, lead));

    [Fact]
    public async Task Summary_SmallCells_HiddenAndNotRecoverableFromTotals()
    {
        using var app = new CommunityLeadFactory();
        // harbour: one action-level home — it must not be findable; the others are large enough to show.
        Add(app, Many("harbour", Band.Low, 40, 3).Concat(Many("harbour", Band.Action, 1, 14))
            .Concat(Many("old-mill", Band.Low, 30, 2)).Concat(Many("old-mill", Band.Action, 12, 16))
            .Concat(Many("hillcrest", Band.NotDetected, 25, 1)).Concat(Many("hillcrest", Band.Low, 20, 4)));
        var health = app.CreateClient(Roles.Health);
        var report = await GetAsync(health, "/api/reports/summary?groupBy=area");

        var rows = report["rows"]!.AsArray().Select(r => r!.AsObject()).ToList();
        var harbour = rows.Single(r => r["group"]!.GetValue<string>() == "harbour");
        Assert.True(harbour["lead"]!["action"]!["suppressed"]!.GetValue<bool>());
        Assert.Null(harbour["lead"]!["action"]!["value"]?.GetValue<int?>());
        Assert.Null(harbour["shareAtOrAboveActionLevel"]?.GetValue<object>()); // its statistic would give it away too
        // An attacker with every shown cell and total (CMS cell size policy: 1–10 hidden) learns no hidden count exactly.
        var truth = new[] { new[] { 0, 40, 0, 1, 0, 0 }, [0, 30, 0, 12, 0, 0], [25, 20, 0, 0, 0, 0] };
        var order = new[] { "harbour", "old-mill", "hillcrest" };
        var table = new SuppressedTable(
            [.. order.Select(a => BandKeys.Select(b => Hidden(rows.Single(r => r["group"]!.GetValue<string>() == a)["lead"]![b]!)).ToArray())],
            "from the API")
        {
            RowTotalsSuppressed = [.. order.Select(a => Hidden(rows.Single(r => r["group"]!.GetValue<string>() == a)["kitsAnalyzed"]!))],
            ColumnTotalsSuppressed = [.. BandKeys.Select(b => Hidden(report["total"]!["lead"]![b]!))],
            GrandTotalSuppressed = Hidden(report["total"]!["kitsAnalyzed"]!),
        };
        var attacker = new SuppressionAttacker(truth, table);
        Assert.NotEmpty(attacker.Hidden);
        Assert.Empty(attacker.Peel());
        Assert.Empty(attacker.DeterminedByAlgebra());
        // A row with no small count and no complement still shows in full.
        var hillcrest = rows.Single(r => r["group"]!.GetValue<string>() == "hillcrest");
        Assert.Equal(25, hillcrest["lead"]!["notDetected"]!["value"]!.GetValue<int>());
        Assert.False(hillcrest["suppressed"]!.GetValue<bool>());
    }

    private static bool Hidden(JsonNode cell) => cell["suppressed"]!.GetValue<bool>();

    [Fact]
    public async Task Summary_TwentyFirstDraws_NinetiethIsThe18thRanked()
    {
        // 40 CFR 141.80(c)(3): 20 samples → the 18th ranked value (published worked examples).
        using var app = new CommunityLeadFactory();
        Add(app, Enumerable.Range(1, 20).Select(i => new SeedKit("harbour", Band.Low, i)));
        var report = await GetAsync(app.CreateClient(Roles.Health), "/api/reports/summary?groupBy=area");
        var row = report["rows"]![0]!;
        Assert.Equal(18, row["firstDrawLead90thPercentile"]!["value"]!.GetValue<double>());
        Assert.Equal("informational", row["firstDrawLead90thPercentile"]!["note"]!.GetValue<string>());
    }

    [Fact]
    public async Task Summary_ShareAtOrAboveActionLevel_WilsonInterval()
    {
        // 25 of 100 at or above the action level; 95 % Wilson score interval (Wilson 1927), worked by hand with z = 1.96:
        // centre (0.25 + 1.96²/200) / (1 + 1.96²/100) = 0.25925; half-width 1.96·√(0.001875 + 0.000096) / 1.0384 = 0.08380.
        using var app = new CommunityLeadFactory();
        Add(app, Many("harbour", Band.Low, 75, 3).Concat(Many("harbour", Band.Action, 25, 15)));
        var share = (await GetAsync(app.CreateClient(Roles.Health), "/api/reports/summary?groupBy=area"))["rows"]![0]!["shareAtOrAboveActionLevel"]!;
        Assert.Equal(0.25, share["proportion"]!.GetValue<double>(), 9);
        Assert.InRange(share["low95"]!.GetValue<double>(), 0.1754, 0.1755);
        Assert.InRange(share["high95"]!.GetValue<double>(), 0.3430, 0.3431);
        Assert.Equal(100, share["of"]!.GetValue<int>());
    }

    [Fact]
    public async Task Summary_FiveSamplesNoThreshold_MeanOfTheTwoHighest()
    {
        // 0.008, 0.008, 0.008, 0.011, 0.020 mg/L → (0.011 + 0.020) / 2 = 0.0155 mg/L = 15.5 µg/L (state guidance worked example).
        using var app = new CommunityLeadFactory();
        using var open = app.WithWebHostBuilder(b => b.UseSetting("Reports:SuppressionThreshold", "0"));
        Add(app, new[] { 8.0, 8, 8, 11, 20 }.Select(v => new SeedKit("harbour", v >= 10 ? Band.Action : Band.Low, v)));
        var client = open.CreateClient();
        client.DefaultRequestHeaders.Authorization = new("Bearer", app.CreateKey(Roles.Health));
        var row = (await GetAsync(client, "/api/reports/summary?groupBy=area"))["rows"]![0]!;
        Assert.Equal(15.5, row["firstDrawLead90thPercentile"]!["value"]!.GetValue<double>(), 9);
    }

    [Fact]
    public async Task Summary_NonDetects_MedianByKaplanMeierNotHalfTheLimit()
    {
        // Helsel's illustration, scaled: <1, <1, 2, 3, 5 (×11 homes each, so no band count is small enough to hide) → median 2, never a substituted 0.5.
        using var app = new CommunityLeadFactory();
        var values = new[] { (1.0, true), (1.0, true), (2.0, false), (3.0, false), (5.0, false) };
        Add(app, Enumerable.Range(0, 11).SelectMany(_ => values).Select(v => new SeedKit("harbour", v.Item2 ? Band.NotDetected : Band.Low, v.Item1, v.Item2)));
        var row = (await GetAsync(app.CreateClient(Roles.Health), "/api/reports/summary?groupBy=area"))["rows"]![0]!;
        Assert.Equal(2, row["firstDrawLeadMedian"]!["value"]!.GetValue<double>());
        Assert.False(row["firstDrawLeadMedian"]!["atMost"]!.GetValue<bool>());
    }

    [Fact]
    public async Task Summary_FiltersAndGroupings_CountOnlyWhatIsAsked()
    {
        using var app = new CommunityLeadFactory();
        Add(app, Enumerable.Range(0, 12).Select(_ => new SeedKit("harbour", Band.Low, 2, YearBuilt: 1930))
            .Concat(Enumerable.Range(0, 14).Select(_ => new SeedKit("harbour", Band.Low, 2, YearBuilt: 1990)))
            .Concat(Enumerable.Range(0, 11).Select(_ => new SeedKit("harbour", Band.Low, 2, YearBuilt: 1960,
                CollectedUtc: new DateTime(2026, 7, 2, 6, 0, 0, DateTimeKind.Utc)))));
        var health = app.CreateClient(Roles.Health);
        var byAge = await GetAsync(health, "/api/reports/summary?groupBy=age-band");
        Assert.Equal(["before-1950", "1950-1985", "1986-and-later"], byAge["rows"]!.AsArray().Select(r => r!["group"]!.GetValue<string>()));
        var old = await GetAsync(health, "/api/reports/summary?groupBy=quarter&ageBand=before-1950");
        Assert.Equal(12, old["total"]!["kitsIssued"]!["value"]!.GetValue<int>());
        var q2 = await GetAsync(health, "/api/reports/summary?groupBy=quarter&from=2026-04-01&to=2026-06-30");
        Assert.Equal("2026-Q2", q2["rows"]![0]!["group"]!.GetValue<string>());
        Assert.Equal(26, q2["total"]!["kitsIssued"]!["value"]!.GetValue<int>());
        var bad = await health.GetAsync("/api/reports/summary?groupBy=street");
        Assert.Equal(HttpStatusCode.BadRequest, bad.StatusCode);
    }

    [Fact]
    public async Task Summary_Csv_SameTableAsTextWithSuppressedMarked()
    {
        using var app = new CommunityLeadFactory();
        Add(app, Many("harbour", Band.Low, 30, 2).Concat(Many("old-mill", Band.Low, 3, 2)));
        var response = await app.CreateClient(Roles.Health).GetAsync("/api/reports/summary?groupBy=area&format=csv");
        Assert.Equal("text/csv", response.Content.Headers.ContentType!.MediaType);
        var lines = (await response.Content.ReadAsStringAsync()).Split('\n', StringSplitOptions.RemoveEmptyEntries);
        Assert.StartsWith("area,kitsIssued,", lines[0]);
        Assert.StartsWith("harbour,", lines[1]);
        Assert.Contains("suppressed", lines.Single(l => l.StartsWith("old-mill,")));
        Assert.Single(lines, l => l.StartsWith("total,"));
        Assert.Contains(lines, l => l.StartsWith("protection,one protected table set"));
    }

    [Theory]
    [InlineData("=SUM(A1)", "'=SUM(A1)")]
    [InlineData("+1", "'+1")]
    [InlineData("-2", "'-2")]
    [InlineData("@cmd", "'@cmd")]
    [InlineData("harbour", "harbour")]
    [InlineData("a,b", "\"a,b\"")]
    public void SummaryCsv_CellsThatLookLikeFormulas_Escaped(string cell, string written) =>
        // OWASP "CSV Injection": prefix cells starting with = + - @ so spreadsheets treat them as text (common practice).
        Assert.Equal(written, CommunityLead.Api.Features.Reports.SummaryCsv.Escape(cell));
}

public class SummaryPeriodTests
{
    [Theory]
    [InlineData("from=2026-04-02", "from")]
    [InlineData("to=2026-04-29", "to")]
    public async Task Summary_PeriodNotOnWholeMonths_400SoDifferencesCannotRevealSmallCounts(string query, string field)
    {
        using var app = new CommunityLeadFactory();
        var response = await app.CreateClient(CommunityLead.Api.Auth.Roles.Health).GetAsync($"/api/reports/summary?groupBy=area&{query}");
        Assert.Equal(HttpStatusCode.BadRequest, response.StatusCode);
        Assert.Contains(field, await response.Content.ReadAsStringAsync());
    }
}
