using System.Net;
using System.Net.Http.Json;
using CommunityLead.Api.Auth;
using CommunityLead.Api.Commands;
using CommunityLead.Tests.Infrastructure;
using Microsoft.Data.Sqlite;

namespace CommunityLead.Tests.Commands;

public class BackupUnderWritesTests
{
    [SqliteFact]
    public async Task Backup_WhileHouseholdsSignUp_CopyIsConsistentAndHoldsEveryRowCommittedBeforeIt()
    {
        using var app = new CommunityLeadFactory();
        var coordinator = app.CreateClient(Roles.Coordinator);
        using var stop = new CancellationTokenSource();
        var committed = 0;
        // A stream of writes, bounded in count, while the backup runs.
        var writer = Task.Run(async () =>
        {
            for (var i = 0; i < 400 && !stop.IsCancellationRequested; i++)
            {
                var response = await coordinator.PostAsJsonAsync("/api/households", Fixtures.Household());
                Assert.Equal(HttpStatusCode.Created, response.StatusCode);
                Interlocked.Increment(ref committed);
            }
        });
        while (Volatile.Read(ref committed) < 50) await Task.Delay(10);

        var before = Volatile.Read(ref committed);
        var target = Path.Combine(Path.GetDirectoryName(app.DatabaseFile)!, "during-writes.db");
        using var output = new StringWriter();
        Assert.Equal(0, await CommandLine.RunAsync(["backup", target], app.Services, output, TextWriter.Null));
        await stop.CancelAsync();
        await writer;

        await using var copy = new SqliteConnection($"Data Source={target};Mode=ReadOnly");
        await copy.OpenAsync();
        await using var check = copy.CreateCommand();
        check.CommandText = "PRAGMA integrity_check";
        Assert.Equal("ok", (string)(await check.ExecuteScalarAsync())!);
        check.CommandText = "SELECT count(*) FROM Households";
        var households = (long)(await check.ExecuteScalarAsync())!;
        check.CommandText = "SELECT count(*) FROM AuditTrail WHERE Action = 'sign-up'";
        var signUps = (long)(await check.ExecuteScalarAsync())!;
        // Every sign-up committed before the backup began is in it, and each household came with its audit entry.
        Assert.True(households >= before, $"{households} households in the copy, {before} committed before it");
        Assert.Equal(households, signUps);
        await copy.CloseAsync();

        // Restore as DEVELOPERS.md says: the copy becomes the database file of a service that starts on it.
        using var restored = new CommunityLeadFactory();
        Directory.CreateDirectory(Path.GetDirectoryName(restored.DatabaseFile)!);
        File.Copy(target, restored.DatabaseFile);
        Assert.Equal(households, restored.WithDb(db => db.Households.LongCount()));
        var response = await restored.CreateClient(Roles.Coordinator).GetAsync("/api/kits");
        Assert.Equal(HttpStatusCode.OK, response.StatusCode);
    }
}
