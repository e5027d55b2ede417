using CommunityLead.Api.Auth;
using CommunityLead.Api.Data;
using CommunityLead.Api.Features.Operations;
using CommunityLead.Api.Infrastructure;
using Microsoft.AspNetCore.Http.Json;
using Microsoft.EntityFrameworkCore;
using Microsoft.Extensions.Options;

namespace CommunityLead.Api.Features.Interpretation;

/// <summary>
/// Interprets the kits <see cref="StaleKits"/> finds, logging each repair by kit code only (never who lives
/// there). Results saved before interpretation shared their transaction could be left so for good (a client that
/// disconnected, a process killed after the save). Several instances may repair at once: a kit is interpreted only
/// if its version is still the one it was found with, and each chunk is one save guarded by those versions, so
/// a kit another instance interpreted first is skipped or makes the chunk fail whole (nothing of it written).
/// </summary>
public sealed class InterpretationRepair(CommunityLeadDb db, ProfileCatalog catalog, IOptions<JsonOptions> json,
    TimeProvider clock, ILogger<InterpretationRepair> log)
{
    /// <summary>Who the audit trail and the interpretation name: the service itself, not a person's key.</summary>
    public static readonly Actor Actor = new("interpretation-repair", "service");

    private const int ChunkSize = 200;
    /// <summary>Chunks lost to another instance before this run leaves the rest to the next sweep.</summary>
    private const int LostRacesAllowed = 5;

    /// <summary>The codes of the kits interpreted now.</summary>
    public async Task<IReadOnlyList<string>> RepairAsync(RepairScope scope, CancellationToken ct)
    {
        var repaired = new List<string>();
        var (afterId, lostRaces) = (0, 0);
        while (lostRaces <= LostRacesAllowed)
        {
            db.ChangeTracker.Clear();
            var due = await StaleKits.AnalyzedAsync(db, scope, afterId, ChunkSize, ct);
            if (due.Count == 0) break;
            if (await InterpretAsync(due, "its results were all in but it had not been interpreted", ct) is { } done)
            {
                repaired.AddRange(done);
                afterId = due[^1].Id;
            }
            // Lost: the same kits are read again; those another instance interpreted are no longer analyzed.
            else lostRaces++;
        }

        db.ChangeTracker.Clear();
        var changed = await StaleKits.ChangedSinceInterpretedAsync(db, scope, json.Value.SerializerOptions, ct);
        foreach (var chunk in changed.Chunk(ChunkSize))
            repaired.AddRange(await InterpretAsync(chunk, "its results changed after it was interpreted", ct) ?? []);
        return repaired;
    }

    /// <summary>Interprets and saves one chunk; null when it lost a race (nothing written).</summary>
    private async Task<List<string>?> InterpretAsync(IReadOnlyList<DueKit> due, string why, CancellationToken ct)
    {
        db.ChangeTracker.Clear();
        var found = due.ToDictionary(d => d.Id);
        var ids = found.Keys.ToList();
        // The interpreting below raises each kit's version from the one it reads and fails whole if another instance moved one meanwhile.
        var kits = await db.Kits.AsNoTracking().Where(k => ids.Contains(k.Id)).ToListAsync(ct);
        var unchanged = kits.Where(k => k.Version == found[k.Id].Version).ToDictionary(k => k.Id, k => k.Version);
        if (unchanged.Count == 0) return [];
        var now = clock.GetUtcNow().UtcDateTime;
        IReadOnlyDictionary<int, CommunityLead.Rules.Interpretation.Interpretation> outcomes;
        try
        {
            outcomes = await KitInterpreting.InterpretAndCommitAsync(db, catalog, unchanged, Actor, now, json.Value.SerializerOptions, ct);
        }
        catch (DbUpdateException e) when (StoreErrors.IsLostRace(e))
        {
            log.LogInformation("Another instance changed some of {Count} kits while they were being repaired; they are read again.", unchanged.Count);
            return null;
        }
        ServiceMetrics.Interpreted(outcomes.Values.Select(o => o.Band));
        var codes = new List<string>();
        foreach (var (id, outcome) in outcomes.OrderBy(o => o.Key))
        {
            codes.Add(found[id].Code);
            log.LogWarning("Repaired kit {KitCode}: {Why}; interpreted now, band {Band}.", found[id].Code, why, KebabEnum.Name(outcome.Band));
        }
        return codes;
    }
}
