using System.Net;
using BenchmarkDotNet.Attributes;
using BenchmarkDotNet.Engines;
using CommunityLead.Api.Auth;
using CommunityLead.Api.Data;
using Microsoft.EntityFrameworkCore;
using Microsoft.Extensions.DependencyInjection;

namespace CommunityLead.Benchmarks;

/// <summary>
/// The health department's summary over 1,000,000 interpreted kits (200,000 homes, 8 areas, two years), each with a
/// first-draw lead result: one GROUP BY for the counts, the first-draw values for the order statistics.
/// </summary>
[MemoryDiagnoser]
[SimpleJob(RunStrategy.Monitoring, launchCount: 1, warmupCount: 1, iterationCount: 5)]
public class SummaryBenchmark
{
    private const int Homes = 200_000;
    private const int Kits = 1_000_000;
    private BenchmarkHost? host;
    private HttpClient? health;

    [Params("area", "month")]
    public string GroupBy { get; set; } = "area";

    [GlobalSetup]
    public void Seed()
    {
        host = new BenchmarkHost();
        health = host.ClientFor(Roles.Health);
        using var scope = host.Services.CreateScope();
        var db = scope.ServiceProvider.GetRequiredService<CommunityLeadDb>();
        db.Database.SetCommandTimeout(TimeSpan.FromMinutes(10));
        // Rows are written by SQL directly: a million kits through the API would measure the seeding, not the report.
        db.Database.ExecuteSqlRaw($"""
            WITH RECURSIVE n(i) AS (SELECT 0 UNION ALL SELECT i + 1 FROM n WHERE i < {Homes - 1})
            INSERT INTO Households (Id, Name, Language, ConsentVersion, ConsentGivenAt, AreaCode, WaterSource, YearBuilt, ServiceLine,
                ChildUnder6, Pregnant, FilterInUse, CreatedAtUtc, UpdatedAtUtc, Address_City, Address_Line1, Address_PostalCode)
            SELECT printf('00000000-0000-0000-0000-%012X', i), 'Bench Home', 'En', 'v1', '2026-01-01 00:00:00+00:00',
                   'area-' || (i % 8), 'Public', 1900 + (i % 121), CASE i % 5 WHEN 0 THEN 'Lead' WHEN 1 THEN 'Galvanized' ELSE 'Copper' END,
                   CASE WHEN i % 5 = 0 THEN 1 ELSE 0 END, 0, 0, '2026-01-01 00:00:00', '2026-01-01 00:00:00', 'Nowhere', '1 Bench Row', '00000'
            FROM n;
            """);
        db.Database.ExecuteSqlRaw($"""
            WITH RECURSIVE n(i) AS (SELECT 0 UNION ALL SELECT i + 1 FROM n WHERE i < {Kits - 1})
            INSERT INTO Kits (Code, Kind, State, HouseholdId, IssuedAtUtc, UpdatedAtUtc, ReceivedAt, Version, Band, LeadBand, CollectedAtUtc, PeriodMonth)
            SELECT printf('B%07d', i), 'Water', 'Interpreted', printf('00000000-0000-0000-0000-%012X', i % {Homes}),
                   '2025-01-01 00:00:00', '2025-01-01 00:00:00', '2025-01-02 00:00:00+00:00', 0,
                   CASE WHEN i % 100 < 30 THEN 'NotDetected' WHEN i % 100 < 85 THEN 'Low' WHEN i % 100 < 95 THEN 'Action' WHEN i % 100 < 97 THEN 'Urgent' ELSE 'Retest' END,
                   CASE WHEN i % 100 < 30 THEN 'NotDetected' WHEN i % 100 < 85 THEN 'Low' WHEN i % 100 < 95 THEN 'Action' WHEN i % 100 < 97 THEN 'Urgent' ELSE 'Retest' END,
                   strftime('%Y-%m-%d %H:%M:%S', '2025-01-01', '+' || (i % 730) || ' days'),
                   CAST(strftime('%Y%m', '2025-01-01', '+' || (i % 730) || ' days') AS INTEGER)
            FROM n;
            INSERT INTO LabBatches (BatchId, Version, Method, AnalyzedAt, AnalyzedAtUtc, ContentHash, Format, Status, QcJson, ResultCount, PostedBy, PostedAtUtc)
            VALUES ('BENCH', 1, 'EPA 200.8', '2026-01-01 00:00:00+00:00', '2026-01-01 00:00:00', 'x', 'json', 'Accepted', 'seeded', {Kits}, 'bench', '2026-01-01 00:00:00');
            INSERT INTO LabResults (LabBatchId, KitId, KitCode, Bottle, Analyte, Value, Unit, OriginalValue, OriginalUnit, Qualifier, Mdl, ReportingLimit, CollectedAt)
            SELECT 1, Id, Code, 'FirstDraw', 'Lead', CASE WHEN LeadBand = 'NotDetected' THEN 1.0 ELSE (Id % 400) / 10.0 + 1 END, 'µg/L',
                   1.0, 'ug/L', CASE WHEN LeadBand = 'NotDetected' THEN '<' END, 0.3, 1.0, '2025-01-01 00:00:00+00:00'
            FROM Kits;
            """);
    }

    [Benchmark(Description = "GET summary of 1,000,000 kits")]
    public async Task<int> Summary()
    {
        var response = await health!.GetAsync($"/api/reports/summary?groupBy={GroupBy}");
        if (response.StatusCode != HttpStatusCode.OK)
            throw new InvalidOperationException($"{(int)response.StatusCode}: {await response.Content.ReadAsStringAsync()}");
        return (await response.Content.ReadAsByteArrayAsync()).Length;
    }

    [GlobalCleanup]
    public void Cleanup()
    {
        health?.Dispose();
        host?.Dispose();
    }
}
