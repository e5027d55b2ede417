using System.Data.Common;
using System.Text;
using Microsoft.EntityFrameworkCore;
using Microsoft.EntityFrameworkCore.Infrastructure;
using Microsoft.EntityFrameworkCore.Metadata;
using Microsoft.EntityFrameworkCore.Storage;

namespace CommunityLead.Api.Data;

/// <summary>
/// Inserts many rows of one entity in multi-row INSERT statements, without the change tracker: a 10,000-row batch
/// saved through SaveChanges was one statement per row (SQLite's provider does not batch) and most of the intake's time.
/// The statement is written from the model with the provider's own quoting and parameter naming, and each value goes
/// through the column's own type mapping (enums as names, UTC times, offsets as text on PostgreSQL), so both stores
/// run the same code and store exactly what SaveChanges would. It runs through the context (interceptors and logging see
/// it) inside the caller's transaction; store-generated keys are left to the database and not read back.
/// </summary>
public static class BulkInsert
{
    /// <summary>Parameters per statement: under SQLite's 32,766 and PostgreSQL's 65,535.</summary>
    private const int MaxParameters = 30_000;
    private const int MaxRows = 1_000;

    public static async Task InsertAsync<T>(CommunityLeadDb db, IReadOnlyList<T> rows) where T : class
    {
        if (rows.Count == 0) return;
        if (db.Database.CurrentTransaction is null)
            throw new InvalidOperationException("A bulk insert runs inside the caller's transaction.");
        var entity = db.Model.FindEntityType(typeof(T)) ?? throw new InvalidOperationException($"{typeof(T).Name} is not in the model.");
        var table = StoreObjectIdentifier.Table(entity.GetTableName()!, entity.GetSchema());
        var columns = entity.GetProperties()
            .Where(p => !(p.IsPrimaryKey() && p.ValueGenerated != ValueGenerated.Never))
            .Select(p => (Property: p, Mapping: (RelationalTypeMapping)p.GetRelationalTypeMapping(), Getter: p.GetGetter()))
            .ToList();
        var sql = db.GetService<ISqlGenerationHelper>();
        var head = $"INSERT INTO {sql.DelimitIdentifier(table.Name, table.Schema)} " +
                   $"({string.Join(", ", columns.Select(c => sql.DelimitIdentifier(c.Property.GetColumnName(table)!)))}) VALUES ";
        var perStatement = Math.Min(MaxRows, MaxParameters / columns.Count);
        // Only to make parameters: each provider's own parameter type, configured by the column's mapping.
        await using var factory = db.Database.GetDbConnection().CreateCommand();
        foreach (var chunk in rows.Chunk(perStatement))
        {
            var text = new StringBuilder(head);
            var parameters = new List<DbParameter>(chunk.Length * columns.Count);
            for (var r = 0; r < chunk.Length; r++)
            {
                text.Append(r == 0 ? "(" : ", (");
                for (var c = 0; c < columns.Count; c++)
                {
                    var (property, mapping, getter) = columns[c];
                    var name = sql.GenerateParameterName($"p{parameters.Count}");
                    parameters.Add(mapping.CreateParameter(factory, name, getter.GetClrValueUsingContainingEntity(chunk[r]), property.IsNullable));
                    text.Append(c == 0 ? "" : ", ").Append(name);
                }
                text.Append(')');
            }
            await db.Database.ExecuteSqlRawAsync(text.ToString(), parameters, CancellationToken.None);
        }
    }
}
