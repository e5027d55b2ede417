using CommunityLead.Api.Data;
using Microsoft.Data.Sqlite;
using Microsoft.EntityFrameworkCore;

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
        await db.Database.MigrateAsync();
    }
}
