using CommunityLead.Api.Features.Reports;
using CommunityLead.Rules.Households;
using CommunityLead.Rules.Interpretation;
using CommunityLead.Rules.Kits;
using CommunityLead.Tests.Infrastructure;
using Microsoft.AspNetCore.Http;
using Microsoft.Extensions.Primitives;
using static CommunityLead.Tests.Features.Reports.ReportSeed;

namespace CommunityLead.Tests.Features.Reports;

/// <summary>
/// The attacker's store: a few hundred water kits over 2026 in three large areas, some on private wells, one area
/// ("cove-end") of three kits in October, and soil kits beside them. Invented, seeded, the same on every run.
/// </summary>
public static class ReportStore
{
    public const string SmallArea = "cove-end";
    public static readonly string[] LargeAreas = ["harbour", "old-mill", "hillcrest"];

    public static void Seed(CommunityLeadFactory app)
    {
        var random = new Random(13);
        Band[] bands = [Band.NotDetected, Band.NotDetected, Band.NotDetected, Band.Low, Band.Low, Band.Low, Band.Low, Band.Advisory, Band.Action, Band.Urgent];
        int?[] years = [1930, 1960, 1995, null];
        var kits = new List<SeedKit>();
        for (var i = 0; i < 300; i++)
        {
            var band = i % 97 == 5 ? Band.Retest : bands[random.Next(bands.Length)];
            kits.Add(new SeedKit(LargeAreas[random.Next(3)], band, band >= Band.Action ? 12 + random.Next(40) : 1 + random.Next(9),
                YearBuilt: years[random.Next(years.Length)], Source: random.Next(10) == 0 ? WaterSource.PrivateWell : WaterSource.Public,
                Child: random.Next(5) == 0, CollectedUtc: new DateTime(2026, 1 + random.Next(12), 1 + random.Next(27), 6, 0, 0, DateTimeKind.Utc),
                ServiceLine: (ServiceLineMaterial)random.Next(5)));
        }
        foreach (var band in new[] { Band.Low, Band.Low, Band.Action })
            kits.Add(new SeedKit(SmallArea, band, band == Band.Action ? 18 : 3, YearBuilt: 1930,
                CollectedUtc: new DateTime(2026, 10, 6, 6, 0, 0, DateTimeKind.Utc)));
        for (var i = 0; i < 40; i++)
            kits.Add(new SeedKit(LargeAreas[random.Next(3)], random.Next(4) == 0 ? Band.Action : Band.Low, 0, Kind: KitKind.Soil,
                CollectedUtc: new DateTime(2026, 4 + random.Next(6), 3, 6, 0, 0, DateTimeKind.Utc)));
        Add(app, kits);
    }

    /// <summary>Every query the health role may send about 2026, whether or not the service accepts it.</summary>
    public static IEnumerable<string> EveryQuery()
    {
        var periods = new List<string> { "" };
        for (var m = 1; m <= 12; m++)
            periods.Add($"from=2026-{m:00}-01&to=2026-{m:00}-{DateTime.DaysInMonth(2026, m):00}");
        for (var q = 0; q < 4; q++)
            periods.Add($"from=2026-{3 * q + 1:00}-01&to=2026-{3 * q + 3:00}-{DateTime.DaysInMonth(2026, 3 * q + 3):00}");
        periods.Add("from=2026-01-01&to=2026-12-31");
        var filters = new List<(string Name, string Grouping, string[] Values)>
        {
            ("areaCode", "area", [.. LargeAreas, SmallArea]), ("waterSource", "water-source", ["public", "private-well"]),
            ("ageBand", "age-band", ["before-1950", "1950-1985", "1986-and-later", "unknown"]),
            ("serviceLine", "service-line", ["unknown", "lead", "galvanized", "copper", "plastic"]),
        };
        string[] groupings = ["area", "month", "quarter", "year", "age-band", "service-line", "band", "water-source", "copper-band", "child-under-six"];
        foreach (var period in periods)
        {
            yield return Join(period, "groupBy=kit-kind");
            foreach (var kind in new[] { "water", "soil" })
            {
                foreach (var g in groupings) yield return Join(period, $"kitKind={kind}&groupBy={g}");
                foreach (var (name, grouping, values) in filters)
                    foreach (var value in values)
                        foreach (var g in new[] { "month", "quarter", "year", grouping })
                            yield return Join(period, $"kitKind={kind}&groupBy={g}&{name}={value}");
            }
        }
    }

    private static string Join(string period, string rest) => period.Length == 0 ? rest : $"{period}&{rest}";

    public static IQueryCollection Query(string query) => new QueryCollection(
        query.Split('&').Select(p => p.Split('=')).ToDictionary(p => p[0], p => new StringValues(p[1])));

    /// <summary>The service's answer without HTTP: the same parse, the same protected set, the same look-up.</summary>
    public static SummaryReport? Answer(string query, Dictionary<ReportKitKind, KindTable> tables, ReportOptions options)
    {
        var (request, _) = SummaryRequest.Parse(Query(query));
        return request is null ? null : SummaryBuilder.Build(request, tables, options);
    }
}
