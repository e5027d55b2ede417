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
/// run the same code and store exactly what SaveChanges would. One command per statement shape is reused for every
/// chunk, on the context's connection inside the caller's transaction (EF Core's command pipeline, per statement,
/// cost more than the insert itself). Store-generated keys are left to the database and not read back.
/// </summary>
public static class BulkInsert
{
    /// <summary>
    /// Parameters per statement. Far below SQLite's 32,766 and PostgreSQL's 65,535 on purpose: binding a named parameter
    /// looks it up among the statement's others, so a statement's cost grows with the square of its parameters
    /// (20,000 a statement made a 10,000-row batch slower than one row a statement).
    /// </summary>
    private const int MaxParameters = 100;

    public static async Task InsertAsync<T>(CommunityLeadDb db, IReadOnlyList<T> rows) where T : class
    {
        if (rows.Count == 0) return;
        var transaction = db.Database.CurrentTransaction?.GetDbTransaction()
            ?? throw new InvalidOperationException("A bulk insert runs inside the caller's transaction.");
        var entity = db.Model.FindEntityType(typeof(T)) ?? throw new InvalidOperationException($"{typeof(T).Name} is not in the model.");
        var table = StoreObjectIdentifier.Table(entity.GetTableName()!, entity.GetSchema());
        var columns = entity.GetProperties()
            .Where(p => !(p.IsPrimaryKey() && p.ValueGenerated != ValueGenerated.Never))
            .Select(p => new Column(p, (RelationalTypeMapping)p.GetRelationalTypeMapping(), p.GetGetter()))
            .ToList();
        var sql = db.GetService<ISqlGenerationHelper>();
        var head = $"INSERT INTO {sql.DelimitIdentifier(table.Name, table.Schema)} " +
                   $"({string.Join(", ", columns.Select(c => sql.DelimitIdentifier(c.Property.GetColumnName(table)!)))}) VALUES ";
        var perStatement = Math.Max(1, MaxParameters / columns.Count);

        DbCommand Command(int rowCount)
        {
            var command = db.Database.GetDbConnection().CreateCommand();
            command.Transaction = transaction;
            var text = new StringBuilder(head);
            for (var r = 0; r < rowCount; r++)
            {
                text.Append(r == 0 ? "(" : ", (");
                for (var c = 0; c < columns.Count; c++)
                {
                    var name = sql.GenerateParameterName($"p{command.Parameters.Count}");
                    command.Parameters.Add(columns[c].Mapping.CreateParameter(command, name, null, columns[c].Property.IsNullable));
                    text.Append(c == 0 ? "" : ", ").Append(name);
                }
                text.Append(')');
            }
            command.CommandText = text.ToString();
            return command;
        }

        await db.Database.OpenConnectionAsync(CancellationToken.None);
        DbCommand? full = null;
        try
        {
            foreach (var chunk in rows.Chunk(perStatement))
            {
                var command = chunk.Length == perStatement ? full ??= Command(perStatement) : Command(chunk.Length);
                var parameter = 0;
                foreach (var row in chunk)
                    foreach (var column in columns)
                        command.Parameters[parameter++].Value = column.Value(row);
                await command.ExecuteNonQueryAsync(CancellationToken.None);
                if (command != full) await command.DisposeAsync();
            }
        }
        finally
        {
            if (full is not null) await full.DisposeAsync();
            await db.Database.CloseConnectionAsync();
        }
    }

    private sealed record Column(IProperty Property, RelationalTypeMapping Mapping, IClrPropertyGetter Getter)
    {
        /// <summary>The value as the store holds it: the column's converter, as SaveChanges would apply it.</summary>
        public object Value(object row)
        {
            var value = Getter.GetClrValueUsingContainingEntity(row);
            if (value is not null && Mapping.Converter is { } converter) value = converter.ConvertToProvider(value);
            return value ?? DBNull.Value;
        }
    }
}
