using System.Data.Common;
using System.Runtime.CompilerServices;
using Microsoft.Data.Sqlite;
using Microsoft.EntityFrameworkCore.Diagnostics;

namespace CommunityLead.Api.Infrastructure;

/// <summary>
/// Every SQLite connection waits for a lock instead of failing with "database is locked", and the file
/// runs in write-ahead-log mode so readers never block the one writer. The pragmas belong to the native
/// connection, which the pool keeps open across many requests: they are sent once per native connection, not on
/// every open (three statements before each request's first query, at a thousand requests a second).
/// </summary>
public sealed class SqlitePragmas : DbConnectionInterceptor
{
    private const string Pragmas = "PRAGMA busy_timeout = 10000; PRAGMA journal_mode = WAL; PRAGMA synchronous = NORMAL;";

    private static readonly ConditionalWeakTable<object, object> Configured = [];

    public override void ConnectionOpened(DbConnection connection, ConnectionEndEventData eventData)
    {
        if (!FirstOpen(connection)) return;
        using var command = connection.CreateCommand();
        command.CommandText = Pragmas;
        command.ExecuteNonQuery();
    }

    public override async Task ConnectionOpenedAsync(DbConnection connection, ConnectionEndEventData eventData, CancellationToken cancellationToken = default)
    {
        if (!FirstOpen(connection)) return;
        await using var command = connection.CreateCommand();
        command.CommandText = Pragmas;
        await command.ExecuteNonQueryAsync(cancellationToken);
    }

    /// <summary>True the first time this native connection is seen (the pool hands the same one out again).</summary>
    private static bool FirstOpen(DbConnection connection) =>
        connection is not SqliteConnection { Handle: { } handle } || Configured.TryAdd(handle, Pragmas);
}
