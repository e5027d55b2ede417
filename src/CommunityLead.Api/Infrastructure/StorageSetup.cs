using CommunityLead.Api.Data;
using Microsoft.Data.Sqlite;
using Microsoft.EntityFrameworkCore;

namespace CommunityLead.Api.Infrastructure;

public static class StorageSetup
{
    /// <summary>With no setting at all, a file in the working directory: a fresh clone runs with no setup.</summary>
    public const string DefaultConnectionString = "Data Source=communitylead.db";

    public static void AddCommunityLeadStorage(this IServiceCollection services, IConfiguration configuration)
    {
        var connectionString = configuration.GetConnectionString("CommunityLead") ?? DefaultConnectionString;
        services.AddDbContext<CommunityLeadDb>(o => o
            .UseSqlite(connectionString)
            .AddInterceptors(new SqlitePragmas()));
    }

    /// <summary>Applies pending migrations, creating the database file and its folder if needed.</summary>
    public static async Task MigrateAsync(IServiceProvider services)
    {
        await using var scope = services.CreateAsyncScope();
        var db = scope.ServiceProvider.GetRequiredService<CommunityLeadDb>();
        var file = new SqliteConnectionStringBuilder(db.Database.GetConnectionString()).DataSource;
        var folder = Path.GetDirectoryName(Path.GetFullPath(file));
        if (!string.IsNullOrEmpty(folder)) Directory.CreateDirectory(folder);
        await db.Database.MigrateAsync();
    }
}
