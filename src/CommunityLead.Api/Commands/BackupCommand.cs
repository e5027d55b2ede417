using CommunityLead.Api.Data;
using Microsoft.EntityFrameworkCore;

namespace CommunityLead.Api.Commands;

/// <summary>
/// backup FILE: SQLite's VACUUM INTO writes a consistent snapshot from one read transaction, so the
/// service can keep taking writes meanwhile. Restore by stopping the service and copying FILE back.
/// On PostgreSQL the server's own pg_dump does this job (deploy/README.md).
/// </summary>
internal sealed class BackupCommand(string[] args) : ICommand
{
    public async Task<int> RunAsync(IServiceProvider services, TextWriter output, TextWriter error)
    {
        if (args.Length != 1)
        {
            error.WriteLine("Use: backup FILE");
            return CommandLine.UsageError;
        }
        var target = Path.GetFullPath(args[0]);
        if (File.Exists(target))
        {
            error.WriteLine($"{target} already exists; choose a new file so no backup is overwritten.");
            return CommandLine.UsageError;
        }
        await using var scope = services.CreateAsyncScope();
        var db = scope.ServiceProvider.GetRequiredService<CommunityLeadDb>();
        if (!db.Database.IsSqlite())
        {
            error.WriteLine("backup copies a SQLite database. This service runs on PostgreSQL: use pg_dump (see deploy/README.md, \"Backups with PostgreSQL\").");
            return CommandLine.UsageError;
        }
        await db.Database.ExecuteSqlAsync($"VACUUM INTO {target}");
        output.WriteLine($"Backup written to {target}.");
        return 0;
    }
}
