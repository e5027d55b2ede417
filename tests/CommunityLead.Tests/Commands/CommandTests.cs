using System.Net;
using CommunityLead.Api.Commands;
using CommunityLead.Tests.Infrastructure;
using Microsoft.Data.Sqlite;

namespace CommunityLead.Tests.Commands;

public class CommandTests
{
    private static async Task<(int Exit, string Out, string Err)> RunAsync(CommunityLeadFactory app, params string[] args)
    {
        using var output = new StringWriter();
        using var error = new StringWriter();
        var exit = await CommandLine.RunAsync(args, app.Services, output, error);
        return (exit, output.ToString(), error.ToString());
    }

    [Fact]
    public async Task KeysCreate_PrintsTheKeyAsLastLine_AndItSignsIn()
    {
        using var app = new CommunityLeadFactory();
        var (exit, output, _) = await RunAsync(app, "keys", "create", "--role", "coordinator", "--label", "front-desk");
        Assert.Equal(0, exit);
        var key = output.Split('\n', StringSplitOptions.RemoveEmptyEntries | StringSplitOptions.TrimEntries)[^1];
        var client = app.CreateClient();
        client.DefaultRequestHeaders.Authorization = new("Bearer", key);
        Assert.Equal(HttpStatusCode.OK, (await client.GetAsync("/api/kits")).StatusCode);

        var (_, listing, _) = await RunAsync(app, "keys", "list");
        Assert.Contains("front-desk", listing);
        Assert.DoesNotContain(key.Split('_')[2], listing);

        Assert.Equal(0, (await RunAsync(app, "keys", "revoke", "front-desk")).Exit);
        Assert.Equal(HttpStatusCode.Unauthorized, (await client.GetAsync("/api/kits")).StatusCode);
    }

    [Fact]
    public async Task KeysCreate_LabelOverTheLimit_RefusedSayingItAndNothingWritten()
    {
        // The audit trail names the key by its label, in a 64-character subject key: a longer label broke the
        // command on PostgreSQL (value too long) after it had said nothing was wrong.
        using var app = new CommunityLeadFactory();
        var limit = CommunityLead.Api.Auth.ApiKeyService.LabelMaxLength;
        var (keys, audit) = (app.WithDb(db => db.ApiKeys.Count()), app.WithDb(db => db.AuditTrail.Count()));

        var (exit, output, error) = await RunAsync(app, "keys", "create", "--role", "lab", "--label", new string('l', limit + 1));

        Assert.Equal(CommandLine.UsageError, exit);
        Assert.Contains($"1 to {limit} characters", error);
        Assert.Empty(output.Trim());
        Assert.Equal((keys, audit), (app.WithDb(db => db.ApiKeys.Count()), app.WithDb(db => db.AuditTrail.Count())));
        Assert.Equal(0, (await RunAsync(app, "keys", "create", "--role", "lab", "--label", new string('l', limit))).Exit);
    }

    [Theory]
    [InlineData("keys", "create", "--role", "janitor", "--label", "x")]
    [InlineData("keys", "create", "--label", "no-role")]
    [InlineData("keys", "revoke", "nobody")]
    [InlineData("keys")]
    [InlineData("backup")]
    public async Task Commands_BadArguments_ExplainOnStandardErrorWithNonZeroExit(params string[] args)
    {
        using var app = new CommunityLeadFactory();
        var (exit, output, error) = await RunAsync(app, args);
        Assert.NotEqual(0, exit);
        Assert.NotEmpty(error.Trim());
        Assert.Empty(output.Trim());
    }

    [Fact]
    public async Task Demo_LoadedTwice_AddsNothingTheSecondTime()
    {
        using var app = new CommunityLeadFactory();
        var first = await RunAsync(app, "demo");
        Assert.Equal(0, first.Exit);
        var households = app.WithDb(db => db.Households.Count());
        var kits = app.WithDb(db => db.Kits.Count());
        var audit = app.WithDb(db => db.AuditTrail.Count());
        Assert.True(households >= 10 && kits >= households, $"{households} households, {kits} kits");
        // The scenario shows kits in several states and at least one flagged collection.
        Assert.True(app.WithDb(db => db.Kits.Select(k => k.State).Distinct().Count()) >= 5);
        Assert.True(app.WithDb(db => db.KitFlags.Any()));
        // The lab batches went through the real intake: one held, then corrected; kits interpreted; letters sent. Then four
        // runs with their calibration: one passes, and a bent curve, drifting blanks and an over-range sample are held.
        Assert.Equal(8, app.WithDb(db => db.LabBatches.Count()));
        Assert.Equal(4, app.WithDb(db => db.LabBatches.Count(b => b.Status == CommunityLead.Api.Data.Entities.BatchStatus.Held)));
        Assert.Equal(["BCL-RUN-06", "BCL-RUN-07", "BCL-RUN-08"], app.WithDb(db => db.LabBatches
            .Where(b => b.RunJson != null && b.Status == CommunityLead.Api.Data.Entities.BatchStatus.Held).Select(b => b.BatchId).OrderBy(b => b).ToList()));
        Assert.True(app.WithDb(db => db.Interpretations.Count()) >= 100);
        Assert.True(app.WithDb(db => db.Letters.Count(l => l.SentAtUtc != null)) >= 20);
        Assert.True(app.WithDb(db => db.Attention.Any(a => a.Reason == CommunityLead.Rules.Interpretation.AttentionFlag.Urgent)));
        // Urgent letters went out only after the demo's coordinator resolved their items (the release gate), before sending.
        var released = app.WithDb(db => db.Letters.Where(l => l.SentAtUtc != null && l.ReleasedBy != null)
            .Select(l => new { l.ReleasedBy, l.ReleasedAtUtc, l.SentAtUtc }).ToList());
        Assert.NotEmpty(released);
        Assert.All(released, l => Assert.True(l.ReleasedBy == "demo-loader" && l.ReleasedAtUtc < l.SentAtUtc));
        Assert.False(app.WithDb(db => db.Letters.Any(l => l.SentAtUtc != null && l.ReleasedBy == null
            && db.Attention.Any(a => a.InterpretationId == l.InterpretationId && a.Reason == CommunityLead.Rules.Interpretation.AttentionFlag.Urgent))));
        var letters = app.WithDb(db => db.Letters.Count());

        var second = await RunAsync(app, "demo");
        Assert.Equal(0, second.Exit);
        Assert.Equal(households, app.WithDb(db => db.Households.Count()));
        Assert.Equal(kits, app.WithDb(db => db.Kits.Count()));
        Assert.Equal(audit, app.WithDb(db => db.AuditTrail.Count()));
        Assert.Equal(letters, app.WithDb(db => db.Letters.Count()));
        Assert.Equal(8, app.WithDb(db => db.LabBatches.Count()));
    }

    [PostgresFact]
    public async Task Backup_OnPostgres_RefusesAndPointsToPgDump()
    {
        using var app = new CommunityLeadFactory();
        var target = Path.Combine(Path.GetTempPath(), $"cl-{Guid.NewGuid():N}.db");
        var (exit, output, error) = await RunAsync(app, "backup", target);
        Assert.NotEqual(0, exit);
        Assert.Contains("pg_dump", error);
        Assert.Empty(output.Trim());
        Assert.False(File.Exists(target));
    }

    [SqliteFact]
    public async Task Backup_WritesACopyThatOpensWithTheSameRows()
    {
        using var app = new CommunityLeadFactory();
        await RunAsync(app, "demo");
        var target = Path.Combine(Path.GetDirectoryName(app.DatabaseFile)!, "copy.db");
        Assert.Equal(0, (await RunAsync(app, "backup", target)).Exit);
        await using var copy = new SqliteConnection($"Data Source={target};Mode=ReadOnly");
        await copy.OpenAsync();
        await using var count = copy.CreateCommand();
        count.CommandText = "SELECT count(*) FROM Kits";
        Assert.Equal((long)app.WithDb(db => db.Kits.Count()), (long)(await count.ExecuteScalarAsync())!);
        // A second backup never overwrites the first.
        Assert.NotEqual(0, (await RunAsync(app, "backup", target)).Exit);
    }
}
