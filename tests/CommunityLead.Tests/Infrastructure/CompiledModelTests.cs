using CommunityLead.Api.Data;
using Microsoft.EntityFrameworkCore;
using Microsoft.EntityFrameworkCore.Metadata;

namespace CommunityLead.Tests.Infrastructure;

/// <summary>
/// The service runs on compiled models (Data/CompiledModels) so it need not build its model at start-up. A compiled
/// model is generated code: after a change to an entity or its configuration it silently describes the old schema.
/// Each test compares, item by item, the compiled model with the one the configurations build today.
/// </summary>
public class CompiledModelTests
{
    private const string Regenerate =
        "Regenerate the compiled models (DEVELOPERS.md, Add a migration: dotnet ef dbcontext optimize, both contexts).";

    [Fact]
    public void Sqlite_CompiledModel_MatchesTheConfiguredModel()
    {
        using var db = new CommunityLeadDb(new DbContextOptionsBuilder<CommunityLeadDb>().UseSqlite("Data Source=:memory:").Options);
        AssertSame(db.Model, Api.Data.CompiledModels.Sqlite.CommunityLeadDbModel.Instance);
    }

    [Fact]
    public void Postgres_CompiledModel_MatchesTheConfiguredModel()
    {
        using var db = new PostgresDesignTimeFactory().CreateDbContext([]);
        AssertSame(db.Model, Api.Data.CompiledModels.Postgres.PostgresCommunityLeadDbModel.Instance);
    }

    [Fact]
    public void Fingerprint_SeesAChangedColumn()
    {
        // The comparison must be able to fail: the same model with one column's length changed differs from it.
        using var altered = new AlteredDb(new DbContextOptionsBuilder<AlteredDb>().UseSqlite("Data Source=:memory:").Options);
        var difference = Fingerprint(altered.Model).Except(Fingerprint(Api.Data.CompiledModels.Sqlite.CommunityLeadDbModel.Instance));
        Assert.Single(difference, l => l.StartsWith("Household.Phone ", StringComparison.Ordinal) && l.Contains(" max 7 "));
    }

    private sealed class AlteredDb(DbContextOptions<AlteredDb> options) : CommunityLeadDb(options)
    {
        protected override void OnModelCreating(ModelBuilder modelBuilder)
        {
            base.OnModelCreating(modelBuilder);
            modelBuilder.Entity<Api.Data.Entities.Household>().Property(h => h.Phone).HasMaxLength(7);
        }
    }

    private static void AssertSame(IModel configured, IModel compiled)
    {
        var (expected, actual) = (Fingerprint(configured), Fingerprint(compiled));
        Assert.True(expected.SequenceEqual(actual),
            $"{Regenerate}\nOnly in the configured model:\n  {string.Join("\n  ", expected.Except(actual))}" +
            $"\nOnly in the compiled model:\n  {string.Join("\n  ", actual.Except(expected))}");
    }

    /// <summary>One line per table, column, key, foreign key and index, with what the database and the mapping see.</summary>
    private static List<string> Fingerprint(IModel model)
    {
        var lines = new List<string>();
        foreach (var entity in model.GetEntityTypes())
        {
            var name = entity.ClrType.Name;
            var table = StoreObjectIdentifier.Table(entity.GetTableName() ?? "", entity.GetSchema());
            lines.Add($"{name} table {entity.GetTableName()} view {entity.GetViewName()} base {entity.BaseType?.ClrType.Name}");
            foreach (var property in entity.GetProperties())
                lines.Add($"{name}.{property.Name} {property.ClrType.Name} column {property.GetColumnName(table)} " +
                          $"type {property.GetColumnType()} null {property.IsNullable} max {property.GetMaxLength()} " +
                          $"converter {property.GetTypeMapping().Converter?.GetType().Name} " +
                          $"generated {property.ValueGenerated} token {property.IsConcurrencyToken} default {property.GetDefaultValueSql()}");
            foreach (var key in entity.GetKeys())
                lines.Add($"{name} key {key.GetName()} ({Names(key.Properties)}) primary {key.IsPrimaryKey()}");
            foreach (var foreignKey in entity.GetForeignKeys())
                lines.Add($"{name} fk {foreignKey.GetConstraintName()} ({Names(foreignKey.Properties)}) -> " +
                          $"{foreignKey.PrincipalEntityType.ClrType.Name} {foreignKey.DeleteBehavior} required {foreignKey.IsRequired}");
            foreach (var index in entity.GetIndexes())
                lines.Add($"{name} index {index.GetDatabaseName()} ({Names(index.Properties)}) unique {index.IsUnique} filter {index.GetFilter()}");
            foreach (var navigation in entity.GetNavigations())
                lines.Add($"{name} navigation {navigation.Name} -> {navigation.TargetEntityType.ClrType.Name} many {navigation.IsCollection}");
        }
        lines.Sort(StringComparer.Ordinal);
        return lines;
    }

    private static string Names(IEnumerable<IReadOnlyProperty> properties) => string.Join(", ", properties.Select(p => p.Name));
}
