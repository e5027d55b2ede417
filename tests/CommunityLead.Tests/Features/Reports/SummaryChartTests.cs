using System.Net;
using System.Xml.Linq;
using CommunityLead.Api.Auth;
using CommunityLead.Rules.Interpretation;
using CommunityLead.Tests.Infrastructure;
using static CommunityLead.Tests.Features.Reports.ReportSeed;

namespace CommunityLead.Tests.Features.Reports;

/// <summary>Many homes in one area, two in another: the second area's counts are suppressed.</summary>
public static class TwoAreas
{
    private static readonly (Band Band, double Lead)[] Bands =
        [(Band.NotDetected, 0.5), (Band.Low, 3), (Band.Advisory, 8), (Band.Action, 18), (Band.Urgent, 60)];

    /// <summary>Harbor and cove: twelve homes in each band (no cell under the threshold of 10); ridge: two homes.</summary>
    public static void Seed(CommunityLeadFactory app) => Add(app,
        Bands.SelectMany(b => Enumerable.Range(0, 12).Select(_ => new SeedKit("harbor", b.Band, b.Lead, Below: b.Band == Band.NotDetected)))
            .Concat(Bands.SelectMany(b => Enumerable.Range(0, 12).Select(_ => new SeedKit("cove", b.Band, b.Lead, Below: b.Band == Band.NotDetected))))
            .Concat([new SeedKit("ridge", Band.Action, 22), new SeedKit("ridge", Band.Low, 3)]));
}

public class SummaryChartTests
{
    [Theory]
    [InlineData("lead-bands", "en", "hidden: too few homes")]
    [InlineData("share-at-action-level", "es", "oculto: pocos hogares")]
    public async Task Chart_SuppressedGroup_DrawnHatchedAndSaidNeverAsABar(string chart, string lang, string hiddenWords)
    {
        using var app = new CommunityLeadFactory();
        TwoAreas.Seed(app);
        var health = app.CreateClient(Roles.Health);

        var response = await health.GetAsync($"/api/reports/summary/chart?chart={chart}&lang={lang}&groupBy=area");

        Assert.Equal(HttpStatusCode.OK, response.StatusCode);
        Assert.Equal("image/svg+xml", response.Content.Headers.ContentType!.MediaType);
        var svg = XDocument.Parse(await response.Content.ReadAsStringAsync()).Root!;
        XNamespace ns = "http://www.w3.org/2000/svg";
        var texts = svg.Descendants(ns + "text").Select(t => t.Value).ToList();
        Assert.Contains("ridge", texts);
        // What the summary hides is drawn hatched with no value (no bar or dot titled with its group); the rest is drawn.
        var summary = System.Text.Json.Nodes.JsonNode.Parse(await health.GetStringAsync("/api/reports/summary?groupBy=area"))!;
        var titled = svg.Descendants(ns + "title").Select(t => t.Value).ToList();
        var hiddenRows = 0;
        foreach (var row in summary["rows"]!.AsArray())
        {
            var group = row!["group"]!.GetValue<string>();
            var hidden = chart == "lead-bands"
                ? row["suppressed"]!.GetValue<bool>() || row["lead"]!.AsObject().Where(c => c.Key != "retest").Any(c => c.Value!["suppressed"]!.GetValue<bool>())
                : row["shareAtOrAboveActionLevel"] is null;
            if (hidden) hiddenRows++;
            Assert.Equal(!hidden, titled.Any(t => t.StartsWith($"{group}:")));
        }
        Assert.Equal(hiddenRows, texts.Count(t => t == hiddenWords));
        Assert.InRange(hiddenRows, 1, 2); // ridge, and at most one area hidden beside it so ridge can't be worked out
        // Only presentation attributes: a style attribute would be refused by the page's CSP.
        Assert.DoesNotContain(svg.DescendantsAndSelf(), e => e.Attribute("style") is not null || e.Name.LocalName == "style");
    }

    [Fact]
    public async Task Chart_UnknownChartOrBadFilter_400NamingTheField()
    {
        using var app = new CommunityLeadFactory();
        var health = app.CreateClient(Roles.Health);
        var unknown = await health.GetAsync("/api/reports/summary/chart?chart=pie");
        Assert.Equal(HttpStatusCode.BadRequest, unknown.StatusCode);
        Assert.Contains("chart", await unknown.Content.ReadAsStringAsync());
        var badDate = await health.GetAsync("/api/reports/summary/chart?chart=lead-bands&from=April");
        Assert.Equal(HttpStatusCode.BadRequest, badDate.StatusCode);
        Assert.Contains("from", await badDate.Content.ReadAsStringAsync());
    }
}
