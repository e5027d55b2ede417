using Microsoft.Data.Sqlite;
using Microsoft.EntityFrameworkCore;
using Npgsql;

namespace CommunityLead.Api.Data;

/// <summary>
/// Tells a lost race from a failed save. Only a race may become "changed meanwhile, post it again": anything else
/// (a value the column refuses, say) would fail again on every retry, so it must surface as the error it is.
/// </summary>
public static class StoreErrors
{
    /// <summary>SQLITE_CONSTRAINT_UNIQUE and SQLITE_CONSTRAINT_PRIMARYKEY (sqlite.org/rescode.html).</summary>
    private static readonly int[] SqliteDuplicates = [2067, 1555];

    /// <summary>Another request changed the same kit (its version moved on) or stored the same unique key first.</summary>
    public static bool IsLostRace(DbUpdateException e) => e is DbUpdateConcurrencyException || e.InnerException switch
    {
        SqliteException sqlite => SqliteDuplicates.Contains(sqlite.SqliteExtendedErrorCode),
        PostgresException postgres => postgres.SqlState == PostgresErrorCodes.UniqueViolation,
        _ => false,
    };
}
