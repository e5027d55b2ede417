using CommunityLead.Api.Data;
using Microsoft.EntityFrameworkCore;

namespace CommunityLead.Tests.Infrastructure;

/// <summary>The connection settings hold on every connection the pool hands out, though they are sent once per native connection.</summary>
public class SqlitePragmaTests
{
    [Fact]
    public void EveryPooledOpen_WaitsForLocksInWalModeWithNormalSync()
    {
        if (TestStore.IsPostgres) return; // SQLite pragmas: PostgreSQL has none of them.
        using var app = new CommunityLeadFactory();
        for (var open = 0; open < 3; open++)
        {
            var (timeout, journal, synchronous) = app.WithDb(db =>
            {
                db.Database.OpenConnection();
                try
                {
                    return (Pragma(db, "busy_timeout"), Pragma(db, "journal_mode"), Pragma(db, "synchronous"));
                }
                finally
                {
                    db.Database.CloseConnection();
                }
            });
            Assert.Equal("10000", timeout);
            Assert.Equal("wal", journal);
            Assert.Equal("1", synchronous); // NORMAL (SQLite documentation, PRAGMA synchronous: 0 OFF, 1 NORMAL, 2 FULL)
        }
    }

    private static string Pragma(CommunityLeadDb db, string name)
    {
        using var command = db.Database.GetDbConnection().CreateCommand();
        command.CommandText = $"PRAGMA {name}";
        return Convert.ToString(command.ExecuteScalar(), System.Globalization.CultureInfo.InvariantCulture)!;
    }
}
