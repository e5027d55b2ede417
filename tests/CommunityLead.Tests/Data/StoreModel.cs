using CommunityLead.Api.Data;
using Microsoft.EntityFrameworkCore;
using Microsoft.EntityFrameworkCore.Metadata;
using Microsoft.EntityFrameworkCore.Storage.ValueConversion;

namespace CommunityLead.Tests.Data;

/// <summary>
/// The EF model of each store, read without a database, as a flat list of columns named
/// "Entity.Property" ("Household.Address.Line1" for a complex property), so tests can ask what a column holds.
/// </summary>
internal static class StoreModel
{
    public sealed record Column(string Name, Type Type, int? MaxLength, ValueConverter? Converter);

    public static readonly Lazy<IReadOnlyList<Column>> Sqlite = new(() =>
    {
        using var db = new CommunityLeadDb(new DbContextOptionsBuilder<CommunityLeadDb>().UseSqlite("Data Source=:memory:").Options);
        return Columns(db.Model);
    });

    public static readonly Lazy<IReadOnlyList<Column>> Postgres = new(() =>
    {
        using var db = new PostgresDesignTimeFactory().CreateDbContext([]);
        return Columns(db.Model);
    });

    /// <summary>The length a column holds; the same in both stores' models (checked by ColumnLengthTests).</summary>
    public static int MaxLength(string column) =>
        Sqlite.Value.Single(c => c.Name == column).MaxLength ?? throw new InvalidOperationException($"{column} has no length limit.");

    private static List<Column> Columns(IModel model) =>
        [.. model.GetEntityTypes().SelectMany(e => Columns(e, e.ClrType.Name))];

    private static IEnumerable<Column> Columns(ITypeBase type, string prefix) =>
        type.GetProperties()
            .Select(p => new Column($"{prefix}.{p.Name}", Nullable.GetUnderlyingType(p.ClrType) ?? p.ClrType, p.GetMaxLength(),
                p.GetValueConverter() ?? p.GetTypeMapping().Converter))
            .Concat(type.GetComplexProperties().SelectMany(c => Columns(c.ComplexType, $"{prefix}.{c.Name}")));
}
