using CommunityLead.Api.Data;
using Microsoft.Data.Sqlite;
using Microsoft.EntityFrameworkCore;
using Npgsql;

namespace CommunityLead.Tests.Infrastructure;

/// <summary>
/// Which database the integration tests run on. SQLite unless COMMUNITYLEAD_TEST_POSTGRES holds a connection
/// string for a PostgreSQL role allowed to create databases; then every test gets a database of its own there,
/// copied from a template migrated once per run (copying is much faster than migrating each time).
/// Set but empty (a `$(.ci/postgres)` that failed) is an error, never a quiet fall-back to SQLite.
/// </summary>
public static class TestStore
{
    public const string Variable = "COMMUNITYLEAD_TEST_POSTGRES";

    // Every integration test reads IsPostgres first, so a throw here fails each of them with this message.
    private static readonly string? Server = ServerFromEnvironment();
    private static readonly Lazy<string> Template = new(CreateTemplate);

    public static bool IsPostgres => Server is not null;

    /// <summary>A fresh, migrated database; returns its connection string.</summary>
    public static string CreatePostgresDatabase()
    {
        var name = $"cl_test_{Guid.NewGuid():N}";
        Execute($"CREATE DATABASE \"{name}\" TEMPLATE \"{Template.Value}\"");
        return For(name);
    }

    /// <summary>A database with nothing in it yet, on whichever store the run uses; dropped when disposed.</summary>
    public static EmptyDatabase CreateEmptyDatabase()
    {
        if (!IsPostgres)
        {
            var folder = Directory.CreateTempSubdirectory("cl-empty").FullName;
            return new EmptyDatabase($"Data Source={Path.Combine(folder, "empty.db")}", () =>
            {
                SqliteConnection.ClearAllPools();
                try { Directory.Delete(folder, recursive: true); } catch (IOException) { }
            });
        }
        var name = $"cl_empty_{Guid.NewGuid():N}";
        Execute($"CREATE DATABASE \"{name}\"");
        var connection = For(name);
        return new EmptyDatabase(connection, () => DropPostgresDatabase(connection));
    }

    public static void DropPostgresDatabase(string connectionString)
    {
        NpgsqlConnection.ClearPool(new NpgsqlConnection(connectionString));
        var name = new NpgsqlConnectionStringBuilder(connectionString).Database;
        // Not WITH (FORCE): that must be allowed to end every session, autovacuum's included, which a role
        // that is not a superuser may not. A plain DROP ends autovacuum itself; a session of ours that is
        // still closing makes it wait a moment.
        for (var attempt = 1; ; attempt++)
        {
            try
            {
                Execute($"DROP DATABASE IF EXISTS \"{name}\"");
                return;
            }
            catch (PostgresException e) when (e.SqlState == PostgresErrorCodes.ObjectInUse && attempt < 50)
            {
                Thread.Sleep(100);
            }
        }
    }

    public static void ClearPools()
    {
        if (IsPostgres) NpgsqlConnection.ClearAllPools();
        else SqliteConnection.ClearAllPools();
    }

    private static string CreateTemplate()
    {
        var name = $"cl_template_{Guid.NewGuid():N}";
        Execute($"CREATE DATABASE \"{name}\"");
        var connection = For(name);
        using (var db = new PostgresCommunityLeadDb(new DbContextOptionsBuilder<PostgresCommunityLeadDb>().UseNpgsql(connection).Options))
            db.Database.Migrate();
        // A database can only be copied while nobody is connected to it.
        NpgsqlConnection.ClearPool(new NpgsqlConnection(connection));
        AppDomain.CurrentDomain.ProcessExit += (_, _) =>
        {
            try { Execute($"DROP DATABASE IF EXISTS \"{name}\""); } catch (NpgsqlException) { }
        };
        return name;
    }

    private static string? ServerFromEnvironment()
    {
        var value = Environment.GetEnvironmentVariable(Variable);
        if (value is null) return null;
        if (string.IsNullOrWhiteSpace(value))
            throw new InvalidOperationException(
                $"{Variable} is set but empty, so these tests would quietly run on SQLite instead of PostgreSQL. " +
                $"The command that should have given the connection string probably failed (see what it wrote on stderr; " +
                $".ci/postgres needs root to start its cluster). Set {Variable} to a connection string, or unset it to test on SQLite.");
        return value;
    }

    private static string For(string database) =>
        new NpgsqlConnectionStringBuilder(Server) { Database = database }.ConnectionString;

    private static void Execute(string sql)
    {
        // Maintenance commands run from the server's own "postgres" database, never from a test's.
        using var connection = new NpgsqlConnection(For("postgres"));
        connection.Open();
        using var command = new NpgsqlCommand(sql, connection);
        command.ExecuteNonQuery();
    }
}

public sealed class EmptyDatabase(string connectionString, Action drop) : IDisposable
{
    public string ConnectionString { get; } = connectionString;
    public void Dispose() => drop();
}

/// <summary>A test that only means something on SQLite (the file itself, WAL, VACUUM INTO).</summary>
public sealed class SqliteFactAttribute : FactAttribute
{
    public SqliteFactAttribute()
    {
        if (TestStore.IsPostgres) Skip = "SQLite only: this test reads the SQLite file or its settings.";
    }
}

/// <summary>A test that only means something on PostgreSQL (several instances on one server).</summary>
public sealed class PostgresFactAttribute : FactAttribute
{
    public PostgresFactAttribute()
    {
        if (!TestStore.IsPostgres) Skip = $"PostgreSQL only: set {TestStore.Variable} to run it.";
    }
}
