using CommunityLead.Api.Data;
using Microsoft.Data.Sqlite;
using Microsoft.EntityFrameworkCore;

namespace CommunityLead.Api.Commands;

/// <summary>
/// backup FILE: SQLite's VACUUM INTO writes a consistent snapshot from one read transaction, so the
/// service can keep taking writes meanwhile. Restore by stopping the service and copying FILE back.
/// On PostgreSQL the server's own pg_dump does this job (deploy/README.md).
/// </summary>
internal sealed class BackupCommand(string file) : ICommand
{
    public async Task<int> RunAsync(IServiceProvider services, TextWriter output, TextWriter error)
    {
        var target = Path.GetFullPath(file);
        if (File.Exists(target))
        {
            error.WriteLine($"{target} already exists; choose a new file so no backup is overwritten.");
            return CommandLine.UsageError;
        }
        var folder = Path.GetDirectoryName(target);
        if (folder is not null && !Directory.Exists(folder))
        {
            // SQLite would only say "unable to open database file"; the folder is what to fix.
            error.WriteLine($"The folder {folder} does not exist; create it first or choose another place for the backup.");
            return CommandLine.Failed;
        }
        await using var scope = services.CreateAsyncScope();
        var db = scope.ServiceProvider.GetRequiredService<CommunityLeadDb>();
        if (!db.Database.IsSqlite())
        {
            error.WriteLine("backup copies a SQLite database. This service runs on PostgreSQL: use pg_dump (see deploy/README.md, \"Backups with PostgreSQL\").");
            return CommandLine.UsageError;
        }
        try
        {
            await db.Database.ExecuteSqlAsync($"VACUUM INTO {target}");
        }
        catch (SqliteException e)
        {
            // A folder without write permission, a full disk: say what and where, never a stack trace.
            error.WriteLine($"The backup could not be written to {target}: {e.Message}");
            return CommandLine.Failed;
        }
        output.WriteLine($"Backup written to {target}.");
        return 0;
    }
}
