using CommunityLead.Api.Data;
using Microsoft.Data.Sqlite;
using Microsoft.EntityFrameworkCore;
using Microsoft.EntityFrameworkCore.Infrastructure;
using Microsoft.EntityFrameworkCore.Migrations;
using Npgsql;

namespace CommunityLead.Api.Infrastructure;

/// <summary>Which database the service keeps its records in: <c>Database:Provider</c>.</summary>
public enum StorageProvider { Sqlite, Postgres }

public static class StorageSetup
{
    /// <summary>With no setting at all, a file in the working directory: a fresh clone runs with no setup.</summary>
    public const string DefaultConnectionString = "Data Source=communitylead.db";

    public static StorageProvider Provider(IConfiguration configuration)
    {
        var name = configuration["Database:Provider"];
        if (string.IsNullOrWhiteSpace(name)) return StorageProvider.Sqlite;
        return Enum.TryParse<StorageProvider>(name, ignoreCase: true, out var provider) && Enum.IsDefined(provider)
            ? provider
            : throw new InvalidOperationException($"Database:Provider is '{name}'; use Sqlite or Postgres.");
    }

    public static void AddCommunityLeadStorage(this IServiceCollection services, IConfiguration configuration)
    {
        var connectionString = configuration.GetConnectionString("CommunityLead");
        if (Provider(configuration) == StorageProvider.Postgres)
        {
            if (string.IsNullOrWhiteSpace(connectionString))
                throw new InvalidOperationException("Database:Provider is Postgres, so ConnectionStrings:CommunityLead must name the server.");
            // Handlers ask for CommunityLeadDb and get the PostgreSQL-mapped model with its own migrations.
            services.AddDbContext<CommunityLeadDb, PostgresCommunityLeadDb>(o => o.UseNpgsql(connectionString));
            return;
        }
        services.AddDbContext<CommunityLeadDb>(o => o
            .UseSqlite(connectionString ?? DefaultConnectionString)
            .AddInterceptors(new SqlitePragmas()));
    }

    /// <summary>
    /// Applies pending migrations (creating a SQLite file's folder if needed). EF Core takes a database-wide
    /// lock while migrating, so several instances starting at once against one PostgreSQL server is safe.
    /// </summary>
    public static async Task MigrateAsync(IServiceProvider services)
    {
        await using var scope = services.CreateAsyncScope();
        var db = scope.ServiceProvider.GetRequiredService<CommunityLeadDb>();
        if (db.Database.IsSqlite())
        {
            var file = new SqliteConnectionStringBuilder(db.Database.GetConnectionString()).DataSource;
            var folder = Path.GetDirectoryName(Path.GetFullPath(file));
            if (!string.IsNullOrEmpty(folder)) Directory.CreateDirectory(folder);
        }
        else
        {
            await CreateHistoryTableAsync(db);
        }
        await db.Database.MigrateAsync();
    }

    /// <summary>
    /// On an empty PostgreSQL database EF Core reads the migrations history before creating it and logs the
    /// failed read as an error ("fail: … __EFMigrationsHistory"), which looks like a broken first start.
    /// Creating the table first avoids that. Two instances may race to create it: the loser's error is harmless.
    /// </summary>
    private static async Task CreateHistoryTableAsync(CommunityLeadDb db)
    {
        var history = db.GetService<IHistoryRepository>();
        if (await history.ExistsAsync()) return;
        try
        {
            await db.Database.ExecuteSqlRawAsync(history.GetCreateIfNotExistsScript());
        }
        catch (PostgresException e) when (e.SqlState is PostgresErrorCodes.UniqueViolation or PostgresErrorCodes.DuplicateTable)
        {
        }
    }
}
