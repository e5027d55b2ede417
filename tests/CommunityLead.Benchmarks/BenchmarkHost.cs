using System.Net.Http.Headers;
using CommunityLead.Api.Auth;
using CommunityLead.Api.Data;
using CommunityLead.Api.Data.Entities;
using CommunityLead.Rules.Households;
using CommunityLead.Rules.Kits;
using CommunityLead.Rules.Sampling;
using Microsoft.AspNetCore.Hosting;
using Microsoft.AspNetCore.Mvc.Testing;
using Microsoft.Data.Sqlite;
using Microsoft.Extensions.DependencyInjection;

namespace CommunityLead.Benchmarks;

/// <summary>The real service on a fresh SQLite file, with received kits ready for results.</summary>
public sealed class BenchmarkHost : WebApplicationFactory<Program>
{
    private readonly string folder = Path.Combine(Path.GetTempPath(), "cl-bench", Guid.NewGuid().ToString("N"));

    protected override void ConfigureWebHost(IWebHostBuilder builder)
    {
        Directory.CreateDirectory(folder);
        builder.UseEnvironment("Benchmark");
        builder.UseSetting("ConnectionStrings:CommunityLead", $"Data Source={Path.Combine(folder, "bench.db")}");
        builder.UseSetting("Logging:LogLevel:Default", "Warning");
    }

    public HttpClient ClientFor(string role)
    {
        using var scope = Services.CreateScope();
        var key = scope.ServiceProvider.GetRequiredService<ApiKeyService>().CreateAsync(role, $"{role}-bench").GetAwaiter().GetResult().Key;
        var client = CreateClient();
        client.DefaultRequestHeaders.Authorization = new AuthenticationHeaderValue("Bearer", key);
        return client;
    }

    /// <summary>Water kits in the received state, each with a first draw and a flushed bottle collected on 2026-04-03.</summary>
    public void SeedReceivedKits(IReadOnlyList<string> codes)
    {
        using var scope = Services.CreateScope();
        var db = scope.ServiceProvider.GetRequiredService<CommunityLeadDb>();
        var now = DateTime.UtcNow;
        var household = new Household
        {
            Id = Guid.NewGuid(), Name = "Benchmark Home", ConsentVersion = "bench", AreaCode = "bench",
            Address = new PostalAddress { Line1 = "1 Test Row", City = "Nowhere", PostalCode = "00000" },
            ConsentGivenAt = DateTimeOffset.UtcNow, CreatedAtUtc = now, UpdatedAtUtc = now,
        };
        db.Households.Add(household);
        var collected = new DateTimeOffset(2026, 4, 3, 6, 0, 0, TimeSpan.Zero);
        foreach (var code in codes)
            db.Kits.Add(new Kit
            {
                Code = code, Kind = KitKind.Water, State = KitState.Received, HouseholdId = household.Id,
                IssuedAtUtc = now, UpdatedAtUtc = now, ReceivedAt = collected.AddDays(1),
                Collections =
                [
                    new Collection
                    {
                        RecordedAtUtc = now, RecordedBy = "bench",
                        Samples =
                        [
                            new Sample { Index = 0, Bottle = BottleType.FirstDraw, VolumeMl = 1000, CollectedAt = collected, CollectedAtUtc = collected.UtcDateTime, WaterLastUsedAt = collected.AddHours(-8), StandingMinutes = 480 },
                            new Sample { Index = 1, Bottle = BottleType.Flushed, VolumeMl = 1000, CollectedAt = collected.AddMinutes(5), CollectedAtUtc = collected.AddMinutes(5).UtcDateTime, FlushSeconds = 120 },
                        ],
                    },
                ],
            });
        db.SaveChanges();
    }

    protected override void Dispose(bool disposing)
    {
        base.Dispose(disposing);
        SqliteConnection.ClearAllPools();
        try { Directory.Delete(folder, recursive: true); } catch (IOException) { }
    }
}
