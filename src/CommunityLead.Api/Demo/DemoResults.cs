using CommunityLead.Api.Auth;
using CommunityLead.Api.Data;
using CommunityLead.Api.Data.Entities;
using CommunityLead.Api.Features.Attention;
using CommunityLead.Api.Features.Interpretation;
using CommunityLead.Api.Features.LabResults;
using CommunityLead.Api.Features.Letters;
using CommunityLead.Api.Infrastructure;
using CommunityLead.Rules.Kits;
using Microsoft.AspNetCore.Http.HttpResults;
using Microsoft.AspNetCore.Http.Json;
using Microsoft.EntityFrameworkCore;
using Microsoft.Extensions.Options;

namespace CommunityLead.Api.Demo;

/// <summary>
/// The demo's lab batches (seed-data/demo-batches, in file order) go through the same intake as a lab's post,
/// so QC, holds, the correction and interpretation happen for real; then some letters are issued and confirmed.
/// Posting a batch again is recognised as a repeat, so loading twice adds nothing.
/// </summary>
public static class DemoResults
{
    private static readonly Actor Lab = new("demo-lab", Roles.Lab);
    private static readonly Actor Coordinator = new("demo-loader", Roles.Coordinator);

    public static async Task<bool> LoadAsync(IServiceProvider services, IReadOnlyList<string> lettersSent, TextWriter error)
    {
        var db = services.GetRequiredService<CommunityLeadDb>();
        var json = services.GetRequiredService<IOptions<JsonOptions>>().Value.SerializerOptions;
        var clock = services.GetRequiredService<TimeProvider>();
        var calendar = services.GetRequiredService<ProgramCalendar>();
        var options = services.GetRequiredService<IOptions<LabIntakeOptions>>().Value;
        var interpreting = services.GetRequiredService<InterpretWithResults>();
        var repair = services.GetRequiredService<InterpretationRepair>();
        var folder = SeedData.Find("demo-batches");
        var files = folder is null ? [] : Directory.GetFiles(folder, "*.json").Order(StringComparer.Ordinal).ToArray();
        var versions = new Dictionary<string, int>();
        foreach (var file in files)
        {
            ParsedBatch parsed;
            await using (var stream = File.OpenRead(file))
                parsed = await JsonBatchReader.ReadAsync(stream, json, new BatchProblemList(options.MaxProblemsListed), CancellationToken.None);
            db.ChangeTracker.Clear();
            // A file is a batch's next version; once that version exists, the file was loaded before.
            var batchId = parsed.Request.BatchId ?? "";
            var version = versions[batchId] = versions.GetValueOrDefault(batchId) + 1;
            if (await db.LabBatches.AnyAsync(b => b.BatchId == batchId && b.Version >= version)) continue;
            var outcome = await BatchIntake.IngestAsync(parsed, new BatchIntakeContext(db, options, json, clock, interpreting, repair, Lab), CancellationToken.None);
            if (outcome.Result is ProblemHttpResult problem)
            {
                error.WriteLine($"{file}: {problem.ProblemDetails.Title} {problem.ProblemDetails.Detail}");
                return false;
            }
        }

        db.ChangeTracker.Clear();
        var ready = await db.Kits.Where(k => lettersSent.Contains(k.Code) && k.State == KitState.Interpreted).ToListAsync();
        if (ready.Count == 0) return true;
        var now = clock.GetUtcNow().UtcDateTime;
        // Sent a few days after collection, as a program would, so the collection-to-letter figures look real.
        DateTime SentAt(Kit kit) => (kit.CollectedAtUtc ?? now).AddDays(3 + kit.Id % 6);
        await ReleaseAsync(db, ready.ToDictionary(k => k.Id, k => SentAt(k).AddHours(-2)));
        var issuing = services.GetRequiredService<LetterIssuing>();
        var letters = await issuing.IssueAsync([.. ready.Select(k => k.Id)], null, Coordinator, CancellationToken.None);
        foreach (var letter in letters)
        {
            var kit = ready.Single(k => k.Id == letter.Record.KitId);
            await LetterHandlers.ConfirmAsync(db, kit, letter.Record, Coordinator, SentAt(kit), calendar, CancellationToken.None);
        }
        await db.SaveChangesAsync();
        return true;
    }

    /// <summary>
    /// Urgent and implausible results hold their letters back until a coordinator has checked them and called the
    /// household; the demo's coordinator does so, with a note, as a person would through the API, shortly before
    /// each letter is sent (the time given per kit).
    /// </summary>
    private static async Task ReleaseAsync(CommunityLeadDb db, IReadOnlyDictionary<int, DateTime> releaseAt)
    {
        var pending = (await LetterRelease.ForAsync(db, [.. releaseAt.Keys], CancellationToken.None)).Values
            .SelectMany(r => r.Pending).Select(p => p.Id).ToList();
        if (pending.Count == 0) return;
        foreach (var item in await db.Attention.Where(a => pending.Contains(a.Id)).ToListAsync())
            AttentionResolving.Resolve(db, item, Coordinator, releaseAt[item.KitId],
                "Checked the result with the lab and called the household (demo scenario).");
        await db.SaveChangesAsync();
    }
}
