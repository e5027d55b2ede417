using CommunityLead.Rules.Kits;
using Microsoft.Data.Sqlite;

namespace CommunityLead.Benchmarks.Http;

/// <summary>
/// Realistic stores written straight into a database the service has migrated: one household per kit (five areas,
/// every water source, service line and age), two bottles a kit (a first draw after 8 h standing and a flushed
/// one). Written with prepared statements in one transaction: seeding a million kits through the API would measure
/// the seeding. The enum words are the store's own (the service's value converters write "FirstDraw", "Received").
/// </summary>
internal static class StoreSeeder
{
    private static readonly string[] Areas = ["harbour", "mill-row", "north-bank", "old-town", "the-heights"];
    private static readonly string[] Lines = ["Unknown", "Lead", "Galvanized", "Copper", "Plastic"];

    /// <summary>A new store at <paramref name="database"/>, migrated by the service's own command, holding <paramref name="count"/> received kits.</summary>
    public static async Task<IReadOnlyList<string>> NewStoreAsync(string database, int count)
    {
        await Served.CommandAsync(database, "migrate");
        return ReceivedKits(database, count);
    }

    /// <summary>A new store at <paramref name="database"/>, migrated by the service's own command, holding <paramref name="kits"/> interpreted kits.</summary>
    public static async Task NewSummaryStoreAsync(string database, int kits)
    {
        await Served.CommandAsync(database, "migrate");
        InterpretedKits(database, kits);
    }

    /// <summary>Kits received by the lab, waiting for results; their codes, valid check characters included.</summary>
    private static IReadOnlyList<string> ReceivedKits(string database, int count)
    {
        var codes = new HashSet<string>();
        while (codes.Count < count) codes.Add(KitCode.NewCode());
        using var connection = new SqliteConnection($"Data Source={database}");
        connection.Open();
        using var transaction = connection.BeginTransaction();
        var household = Command(connection, """
            INSERT INTO Households (Id, Name, Phone, Language, ConsentVersion, ConsentGivenAt, AreaCode, WaterSource, YearBuilt,
                ServiceLine, ChildUnder6, Pregnant, FilterInUse, CreatedAtUtc, UpdatedAtUtc, Address_City, Address_Line1,
                Address_PostalCode, Address_Region, Version)
            VALUES ($id, $name, '+1 555 0100', $language, '2026-01', '2026-03-01 09:00:00-05:00', $area, $water, $year,
                $line, $child, 0, 0, '2026-03-01 14:00:00', '2026-03-01 14:00:00', 'Brindle Cove', $street, '00001', 'Tallow County', 1)
            """, "$id", "$name", "$language", "$area", "$water", "$year", "$line", "$child", "$street");
        var kit = Command(connection, """
            INSERT INTO Kits (Code, Kind, State, HouseholdId, IssuedAtUtc, UpdatedAtUtc, ReceivedAt, Version, PeriodMonth)
            VALUES ($code, 'Water', 'Received', $household, '2026-03-02 14:00:00', '2026-04-04 16:00:00', '2026-04-04 11:00:00+00:00', 3, 0)
            RETURNING Id
            """, "$code", "$household");
        var collection = Command(connection, """
            INSERT INTO Collections (KitId, RecordedAtUtc, RecordedBy) VALUES ($kit, '2026-04-03 15:00:00', 'seed') RETURNING Id
            """, "$kit");
        var sample = Command(connection, """
            INSERT INTO Samples (CollectionId, "Index", Bottle, VolumeMl, CollectedAt, CollectedAtUtc, WaterLastUsedAt, FlushSeconds, StandingMinutes)
            VALUES ($collection, $index, $bottle, 1000, $at, $atUtc, $lastUsed, $flush, $standing)
            """, "$collection", "$index", "$bottle", "$at", "$atUtc", "$lastUsed", "$flush", "$standing");
        var i = 0;
        foreach (var code in codes)
        {
            var id = Guid.NewGuid().ToString().ToUpperInvariant();
            Run(household, id, $"Seeded Home {i}", i % 4 == 0 ? "Es" : "En", Areas[i % Areas.Length], i % 9 == 0 ? "PrivateWell" : "Public",
                1900 + i % 121, Lines[i % Lines.Length], i % 6 == 0 ? 1 : 0, $"{i % 900 + 1} Heron Close");
            var kitId = (long)Run(kit, code, id)!;
            var collectionId = (long)Run(collection, kitId)!;
            Run(sample, collectionId, 0, "FirstDraw", "2026-04-03 06:00:00+00:00", "2026-04-03 06:00:00", "2026-04-02 22:00:00+00:00", DBNull.Value, 480);
            Run(sample, collectionId, 1, "Flushed", "2026-04-03 06:05:00+00:00", "2026-04-03 06:05:00", DBNull.Value, 120, DBNull.Value);
            i++;
        }
        transaction.Commit();
        return [.. codes];
    }

    /// <summary>
    /// Interpreted kits for the health summary: <paramref name="kits"/> kits over homes five kits apiece, two years
    /// of collections, both bottles' lead results (first draw and flushed) in the bands' proportions.
    /// </summary>
    private static void InterpretedKits(string database, int kits)
    {
        var homes = kits / 5;
        using var connection = new SqliteConnection($"Data Source={database}");
        connection.Open();
        using var transaction = connection.BeginTransaction();
        Execute(connection, $"""
            WITH RECURSIVE n(i) AS (SELECT 0 UNION ALL SELECT i + 1 FROM n WHERE i < {homes - 1})
            INSERT INTO Households (Id, Name, Language, ConsentVersion, ConsentGivenAt, AreaCode, WaterSource, YearBuilt, ServiceLine,
                ChildUnder6, Pregnant, FilterInUse, CreatedAtUtc, UpdatedAtUtc, Address_City, Address_Line1, Address_PostalCode, Version)
            SELECT printf('00000000-0000-0000-0000-%012X', i), 'Seeded Home', 'En', 'v1', '2026-01-01 00:00:00+00:00',
                   CASE i % 5 WHEN 0 THEN 'harbour' WHEN 1 THEN 'mill-row' WHEN 2 THEN 'north-bank' WHEN 3 THEN 'old-town' ELSE 'the-heights' END,
                   CASE WHEN i % 9 = 0 THEN 'PrivateWell' ELSE 'Public' END, 1900 + (i % 121),
                   CASE i % 5 WHEN 0 THEN 'Lead' WHEN 1 THEN 'Galvanized' WHEN 2 THEN 'Unknown' ELSE 'Copper' END,
                   CASE WHEN i % 6 = 0 THEN 1 ELSE 0 END, 0, 0, '2026-01-01 00:00:00', '2026-01-01 00:00:00', 'Brindle Cove', '1 Seed Row', '00001', 1
            FROM n;
            """);
        Execute(connection, $"""
            WITH RECURSIVE n(i) AS (SELECT 0 UNION ALL SELECT i + 1 FROM n WHERE i < {kits - 1})
            INSERT INTO Kits (Code, Kind, State, HouseholdId, IssuedAtUtc, UpdatedAtUtc, ReceivedAt, Version, Band, LeadBand, CollectedAtUtc, PeriodMonth)
            SELECT printf('S%07d', i), 'Water', 'Interpreted', printf('00000000-0000-0000-0000-%012X', i % {homes}),
                   '2025-01-01 00:00:00', '2025-01-01 00:00:00', '2025-01-02 00:00:00+00:00', 3,
                   CASE WHEN i % 100 < 30 THEN 'NotDetected' WHEN i % 100 < 85 THEN 'Low' WHEN i % 100 < 95 THEN 'Action' WHEN i % 100 < 97 THEN 'Urgent' ELSE 'Retest' END,
                   CASE WHEN i % 100 < 30 THEN 'NotDetected' WHEN i % 100 < 85 THEN 'Low' WHEN i % 100 < 95 THEN 'Action' WHEN i % 100 < 97 THEN 'Urgent' ELSE 'Retest' END,
                   strftime('%Y-%m-%d %H:%M:%S', '2025-01-01', '+' || (i % 730) || ' days'),
                   CAST(strftime('%Y%m', '2025-01-01', '+' || (i % 730) || ' days') AS INTEGER)
            FROM n;
            INSERT INTO LabBatches (BatchId, Version, Method, AnalyzedAt, AnalyzedAtUtc, ContentHash, Format, Status, QcJson, ResultCount, PostedBy, PostedAtUtc)
            VALUES ('SEED', 1, 'EPA 200.8', '2026-01-01 00:00:00+00:00', '2026-01-01 00:00:00', 'seed', 'json', 'Accepted', 'seeded', {kits * 2}, 'seed', '2026-01-01 00:00:00');
            INSERT INTO LabResults (LabBatchId, KitId, KitCode, Bottle, Analyte, Value, Unit, OriginalValue, OriginalUnit, Qualifier, Mdl, ReportingLimit, CollectedAt)
            SELECT 1, Id, Code, 'FirstDraw', 'Lead', CASE WHEN LeadBand = 'NotDetected' THEN 1.0 ELSE (Id % 400) / 10.0 + 1 END, 'µg/L',
                   1.0, 'ug/L', CASE WHEN LeadBand = 'NotDetected' THEN '<' END, 0.3, 1.0, CollectedAtUtc || '+00:00'
            FROM Kits;
            INSERT INTO LabResults (LabBatchId, KitId, KitCode, Bottle, Analyte, Value, Unit, OriginalValue, OriginalUnit, Qualifier, Mdl, ReportingLimit, CollectedAt)
            SELECT 1, Id, Code, 'Flushed', 'Lead', CASE WHEN LeadBand = 'NotDetected' THEN 1.0 ELSE (Id % 120) / 10.0 + 1 END, 'µg/L',
                   1.0, 'ug/L', CASE WHEN LeadBand = 'NotDetected' THEN '<' END, 0.3, 1.0, CollectedAtUtc || '+00:00'
            FROM Kits;
            """);
        transaction.Commit();
    }

    private static SqliteCommand Command(SqliteConnection connection, string sql, params string[] names)
    {
        var command = connection.CreateCommand();
        command.CommandText = sql;
        foreach (var name in names) command.Parameters.Add(new SqliteParameter { ParameterName = name });
        command.Prepare();
        return command;
    }

    private static object? Run(SqliteCommand command, params object[] values)
    {
        for (var i = 0; i < values.Length; i++) command.Parameters[i].Value = values[i];
        return command.ExecuteScalar();
    }

    private static void Execute(SqliteConnection connection, string sql)
    {
        using var command = connection.CreateCommand();
        command.CommandText = sql;
        command.CommandTimeout = 600;
        command.ExecuteNonQuery();
    }
}
