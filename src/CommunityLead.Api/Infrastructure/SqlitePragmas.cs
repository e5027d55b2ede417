using System.Data.Common;
using Microsoft.EntityFrameworkCore.Diagnostics;

namespace CommunityLead.Api.Infrastructure;

/// <summary>
/// Every SQLite connection waits for a lock instead of failing with "database is locked", and the file
/// runs in write-ahead-log mode so readers never block the one writer.
/// </summary>
public sealed class SqlitePragmas : DbConnectionInterceptor
{
    private const string Pragmas = "PRAGMA busy_timeout = 10000; PRAGMA journal_mode = WAL; PRAGMA synchronous = NORMAL;";

    public override void ConnectionOpened(DbConnection connection, ConnectionEndEventData eventData)
    {
        using var command = connection.CreateCommand();
        command.CommandText = Pragmas;
        command.ExecuteNonQuery();
    }

    public override async Task ConnectionOpenedAsync(DbConnection connection, ConnectionEndEventData eventData, CancellationToken cancellationToken = default)
    {
        await using var command = connection.CreateCommand();
        command.CommandText = Pragmas;
        await command.ExecuteNonQueryAsync(cancellationToken);
    }
}
