using System.Collections.Frozen;
using System.Globalization;
using System.Runtime.CompilerServices;
using CommunityLead.Api.Data;
using CommunityLead.Rules.Households;
using CommunityLead.Rules.Interpretation;
using CommunityLead.Rules.Kits;
using Microsoft.EntityFrameworkCore;
using Microsoft.EntityFrameworkCore.Storage;
using KitRow = CommunityLead.Api.Features.Reports.ReportKits.KitRow;
using LeadRow = CommunityLead.Api.Features.Reports.ReportKits.LeadRow;

namespace CommunityLead.Api.Features.Reports;

/// <summary>
/// The kits and first-draw lead a decision reads, the queries EF Core writes (the ones ReportQueryPlanTests checks), read
/// by hand. Profiling a decision over a million kits: EF Core's reader took 3.4-3.7 s for the kits. On SQLite every
/// value fetched is a call into the native library (60-100 ns; twelve a row) and EF Core converts enum names with
/// Enum.Parse and stored dates with DateTime.Parse. Here SQLite joins a kit's values into one text, which is split and
/// read here with look-ups: 2.0 s, most of it SQLite stepping through the join itself. PostgreSQL's reader pays nothing
/// per value and its kits come through EF Core. ReportKitReadingTests checks that every row reads as EF Core reads it.
/// </summary>
public static class ReportKitReading
{
    private const char Separator = '\u001f'; // the unit separator: no stored name, code or date holds it
    private const int Columns = 12;
    private static string? sql;

    public static async IAsyncEnumerable<KitRow> KitsAsync(CommunityLeadDb db, [EnumeratorCancellation] CancellationToken ct)
    {
        if (!db.Database.IsSqlite())
        {
            await foreach (var row in ReportKits.KitRows(db).AsAsyncEnumerable().WithCancellation(ct)) yield return row;
            yield break;
        }
        await db.Database.OpenConnectionAsync(ct);
        try
        {
            await using var command = db.Database.GetDbConnection().CreateCommand();
            command.CommandText = sql ??= Packed(ReportKits.KitRows(db).ToQueryString());
            command.Transaction = db.Database.CurrentTransaction?.GetDbTransaction();
            await using var reader = await command.ExecuteReaderAsync(ct);
            while (await reader.ReadAsync(ct)) yield return Row(reader.GetString(0));
        }
        finally
        {
            await db.Database.CloseConnectionAsync();
        }
    }

    /// <summary>First-draw lead on either store: three numbers a row, 1.2-1.3 s through EF Core for a million kits, 0.9 s here.</summary>
    public static async IAsyncEnumerable<LeadRow> FirstDrawLeadAsync(CommunityLeadDb db, [EnumeratorCancellation] CancellationToken ct)
    {
        await db.Database.OpenConnectionAsync(ct);
        try
        {
            await using var command = db.Database.GetDbConnection().CreateCommand();
            command.CommandText = ReportKits.FirstDrawLead(db).ToQueryString();
            command.Transaction = db.Database.CurrentTransaction?.GetDbTransaction();
            await using var reader = await command.ExecuteReaderAsync(ct);
            if (reader.FieldCount != 3) throw new InvalidOperationException($"The lead query returns {reader.FieldCount} values a row, not 3.");
            while (await reader.ReadAsync(ct)) yield return new LeadRow(reader.GetInt32(0), reader.GetDouble(1), reader.GetBoolean(2));
        }
        finally
        {
            await db.Database.CloseConnectionAsync();
        }
    }

    /// <summary>EF Core's query with its columns joined: NULL as an empty value (no name, code or date is empty).</summary>
    public static string Packed(string efSql)
    {
        var names = Enumerable.Range(0, Columns).Select(i => $"\"c{i}\"").ToList();
        return $"WITH \"r\"({string.Join(", ", names)}) AS ({efSql})\nSELECT "
               + string.Join(" || char(31) || ", names.Select(n => $"ifnull({n}, '')")) + " FROM \"r\"";
    }

    private static KitRow Row(string text)
    {
        Span<Range> parts = stackalloc Range[Columns + 1];
        var s = text.AsSpan();
        var count = s.Split(parts, Separator);
        if (count != Columns) throw new InvalidOperationException($"A report row holds {count} values, not {Columns}.");
        return new KitRow(int.Parse(s[parts[0]], CultureInfo.InvariantCulture), Names<KitKind>.Of(s[parts[1]]), StoredDate.Utc(s[parts[2]]),
            s[parts[3]].ToString(),
            Names<WaterSource>.Of(s[parts[4]]), s[parts[5]].IsEmpty ? null : int.Parse(s[parts[5]], CultureInfo.InvariantCulture),
            Names<ServiceLineMaterial>.Of(s[parts[6]]), s[parts[7]] is "1", s[parts[8]] is "1",
            Names<Band>.OrNull(s[parts[9]]), Names<Band>.OrNull(s[parts[10]]), Names<Band>.OrNull(s[parts[11]]));
    }

    /// <summary>An enum stored by its name, as the model's convention stores every enum; a look-up, not Enum.Parse.</summary>
    private static class Names<TEnum> where TEnum : struct, Enum
    {
        private static readonly FrozenDictionary<string, TEnum>.AlternateLookup<ReadOnlySpan<char>> ByName =
            Enum.GetValues<TEnum>().ToFrozenDictionary(v => v.ToString(), StringComparer.Ordinal).GetAlternateLookup<ReadOnlySpan<char>>();

        public static TEnum Of(ReadOnlySpan<char> name) => ByName.TryGetValue(name, out var value) ? value
            : throw new InvalidOperationException($"'{name}' is not a {typeof(TEnum).Name}.");

        public static TEnum? OrNull(ReadOnlySpan<char> name) => name.IsEmpty ? null : Of(name);
    }
}
