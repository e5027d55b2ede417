using CommunityLead.Api.Data.Entities;
using CommunityLead.Rules.Interpretation;
using CommunityLead.Rules.Kits;
using Microsoft.EntityFrameworkCore;

namespace CommunityLead.Api.Data;

/// <summary>
/// Kits read without tracking and changed in memory (a batch moves thousands at once), with the audit entries and
/// attention items their changes raise, written in a few set-based statements instead of a statement per kit: kits
/// that changed alike share one UPDATE, the rows are inserted in bulk (<see cref="BulkInsert"/>). The version guard the
/// change tracker gave is kept: each kit's version is raised by the database from the one it had in the store, and
/// read back; a kit another request changed meanwhile ends up at another version, and the whole save is refused as
/// a lost race (<see cref="DbUpdateConcurrencyException"/>, nothing committed). Only the fields these moves change
/// may differ (state, update time, bands, version); anything else would be lost, so it throws.
/// </summary>
public sealed class KitWrites
{
    private readonly Dictionary<int, (Kit Kit, Kit Before)> kits = [];

    public List<AuditEntry> Audit { get; } = [];
    public List<AttentionItem> Attention { get; } = [];

    /// <summary>Takes note of the kit's values as read, before it is changed; the same instance is returned.</summary>
    public Kit Track(Kit kit)
    {
        kits.TryAdd(kit.Id, (kit, Copy(kit)));
        return kit;
    }

    public void Record(AuditEntry entry) => Audit.Add(entry);

    /// <summary>Writes everything noted, inside the caller's transaction, and starts empty again.</summary>
    public async Task FlushAsync(CommunityLeadDb db)
    {
        foreach (var (kit, before) in kits.Values)
            if (!Equals(Others(kit), Others(before)) || (kit.Version == before.Version && Change.Of(kit, before) != Change.Unchanged))
                throw new InvalidOperationException($"Kit {kit.Code}: only state, update time and bands are written in bulk, with a new version.");
        var changed = kits.Values.Where(k => k.Kit.Version != k.Before.Version).ToList();
        foreach (var group in changed.GroupBy(k => Change.Of(k.Kit, k.Before)))
        {
            var ids = group.Select(k => k.Kit.Id).ToList();
            var change = group.Key;
            await db.Kits.Where(k => ids.Contains(k.Id)).ExecuteUpdateAsync(set =>
            {
                set.SetProperty(k => k.Version, k => k.Version + change.VersionDelta);
                if (change.State is { } state) set.SetProperty(k => k.State, state);
                if (change.UpdatedAtUtc is { } at) set.SetProperty(k => k.UpdatedAtUtc, at);
                if (change.Bands)
                    set.SetProperty(k => k.Band, change.Band).SetProperty(k => k.LeadBand, change.LeadBand)
                        .SetProperty(k => k.CopperBand, change.CopperBand);
            }, CancellationToken.None);
        }
        if (changed.Count > 0)
        {
            var ids = changed.Select(k => k.Kit.Id).ToList();
            var versions = await db.Kits.AsNoTracking().Where(k => ids.Contains(k.Id))
                .Select(k => new { k.Id, k.Version }).ToDictionaryAsync(k => k.Id, k => k.Version, CancellationToken.None);
            if (changed.Select(k => k.Kit).FirstOrDefault(k => versions.GetValueOrDefault(k.Id) != k.Version) is { } raced)
                throw new DbUpdateConcurrencyException($"Kit {raced.Code} was changed meanwhile.");
        }
        await BulkInsert.InsertAsync(db, Audit);
        await BulkInsert.InsertAsync(db, Attention);
        kits.Clear();
        Audit.Clear();
        Attention.Clear();
    }

    /// <summary>What an UPDATE sets: null for a field left as it was.</summary>
    private sealed record Change(int VersionDelta, KitState? State, DateTime? UpdatedAtUtc, bool Bands, Band? Band, Band? LeadBand, Band? CopperBand)
    {
        public static readonly Change Unchanged = new(0, null, null, false, null, null, null);

        public static Change Of(Kit kit, Kit before)
        {
            var bands = (kit.Band, kit.LeadBand, kit.CopperBand) != (before.Band, before.LeadBand, before.CopperBand);
            return new(kit.Version - before.Version, kit.State == before.State ? null : kit.State,
                kit.UpdatedAtUtc == before.UpdatedAtUtc ? null : kit.UpdatedAtUtc, bands,
                bands ? kit.Band : null, bands ? kit.LeadBand : null, bands ? kit.CopperBand : null);
        }
    }

    private static object Others(Kit k) =>
        (k.Code, k.Kind, k.HouseholdId, k.IssuedAtUtc, k.ReceivedAt, k.StateReason, k.ReplacesCode, k.ReplacedByCode, k.CollectedAtUtc,
            (k.PeriodMonth, k.ResultSecretHash));

    private static Kit Copy(Kit k) => new()
    {
        Id = k.Id, Code = k.Code, Kind = k.Kind, State = k.State, HouseholdId = k.HouseholdId, IssuedAtUtc = k.IssuedAtUtc,
        UpdatedAtUtc = k.UpdatedAtUtc, ReceivedAt = k.ReceivedAt, StateReason = k.StateReason, ReplacesCode = k.ReplacesCode,
        ReplacedByCode = k.ReplacedByCode, CollectedAtUtc = k.CollectedAtUtc, PeriodMonth = k.PeriodMonth, Band = k.Band,
        LeadBand = k.LeadBand, CopperBand = k.CopperBand, ResultSecretHash = k.ResultSecretHash, Version = k.Version,
    };
}
