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
            : throw new SettingsException($"Database:Provider must be Sqlite or Postgres; it is {name}.");
    }

    public static void AddCommunityLeadStorage(this IServiceCollection services, IConfiguration configuration)
    {
        var connectionString = configuration.GetConnectionString("CommunityLead");
        // Compiled models (Data/CompiledModels, made by `dotnet ef dbcontext optimize`): building the model from the
        // entity configurations took most of a second of CPU before the first answer. CompiledModelTests fails when
        // one no longer matches the model the configurations build. Contexts are pooled (their options built once,
        // their services kept): a kit read spent a measurable part of its time building a context's options and services.
        if (Provider(configuration) == StorageProvider.Postgres)
        {
            if (string.IsNullOrWhiteSpace(connectionString))
                throw new SettingsException("Database:Provider is Postgres, so ConnectionStrings:CommunityLead must name the server.");
            // Handlers ask for CommunityLeadDb and get the PostgreSQL-mapped model with its own migrations.
            services.AddDbContextPool<CommunityLeadDb, PostgresCommunityLeadDb>(o => o
                .UseModel(Data.CompiledModels.Postgres.PostgresCommunityLeadDbModel.Instance)
                .UseNpgsql(connectionString, npgsql => npgsql.UseParameterizedCollectionMode(ParameterTranslationMode.Parameter)));
            return;
        }
        services.AddDbContextPool<CommunityLeadDb>(o => o
            .UseModel(Data.CompiledModels.Sqlite.CommunityLeadDbModel.Instance)
            .UseSqlite(connectionString ?? DefaultConnectionString,
                sqlite => sqlite.UseParameterizedCollectionMode(ParameterTranslationMode.Parameter))
            .AddInterceptors(new SqlitePragmas()));
    }

    /// <summary>
    /// Applies pending migrations (creating a SQLite file's folder if needed). Several instances may start at
    /// once: on SQLite EF Core's own migration lock serialises them; on PostgreSQL a session advisory lock is held
    /// around the whole run, because EF Core's lock there was seen to let a second instance apply a migration the
    /// first had just applied ("relation … already exists").
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
            if (await UpToDateAsync(db)) return;
            await db.Database.MigrateAsync();
            return;
        }
        await using var lockConnection = new NpgsqlConnection(db.Database.GetConnectionString());
        await lockConnection.OpenAsync();
        // No timeout: another instance's migration may take longer than a command's default 30 s.
        await using (var take = new NpgsqlCommand($"SELECT pg_advisory_lock({MigrationLockKey})", lockConnection) { CommandTimeout = 0 })
            await take.ExecuteNonQueryAsync();
        try
        {
            // Created first, so EF Core's own existence check never reads a missing table (it would log a
            // failed query as an error on every first start).
            var history = db.GetService<IHistoryRepository>();
            await db.Database.ExecuteSqlRawAsync(history.GetCreateIfNotExistsScript());
            if (!await UpToDateAsync(db)) await db.Database.MigrateAsync();
        }
        finally
        {
            await using var release = new NpgsqlCommand($"SELECT pg_advisory_unlock({MigrationLockKey})", lockConnection);
            await release.ExecuteNonQueryAsync();
        }
    }

    /// <summary>
    /// True when every migration is applied: one read of the history table. An existing store usually is, and
    /// MigrateAsync would also build the model's snapshot and compare it with the model (most of a second of CPU at
    /// every start, before the first request). Whether the model needs a migration is MigrationTests' business.
    /// </summary>
    private static async Task<bool> UpToDateAsync(CommunityLeadDb db) => !(await db.Database.GetPendingMigrationsAsync()).Any();

    /// <summary>Any fixed number: it only has to be the same in every instance of this service.</summary>
    private const long MigrationLockKey = 0x434C_4D49_4752_4154; // "CLMIGRAT"
}
