using CommunityLead.Api.Auth;
using CommunityLead.Api.Data;
using CommunityLead.Api.Data.Entities;
using CommunityLead.Rules.Kits;
using Microsoft.EntityFrameworkCore;

namespace CommunityLead.Api.Features.Kits;

/// <summary>
/// Builds the kit view each role may see, from no-tracking projections. The kit is read a thousand times a second
/// by the lab's and coordinators' screens, so its queries are compiled once (no expression tree built, walked and
/// looked up in the query cache per request) and share one connection.
/// </summary>
public static class KitReader
{
    private sealed record KitRow(int Id, string Code, KitKind Kind, KitState State, Guid HouseholdId, DateTime IssuedAtUtc,
        DateTimeOffset? ReceivedAt, string? StateReason, string? ReplacesCode, string? ReplacedByCode);

    private sealed record CurrentRow(List<Sample> Samples, List<KitFlag> Flags);

    private static readonly Func<CommunityLeadDb, string, Task<KitRow?>> KitByCode = EF.CompileAsyncQuery((CommunityLeadDb db, string code) =>
        db.Kits.AsNoTracking().Where(k => k.Code == code)
            .Select(k => new KitRow(k.Id, k.Code, k.Kind, k.State, k.HouseholdId, k.IssuedAtUtc, k.ReceivedAt, k.StateReason,
                k.ReplacesCode, k.ReplacedByCode))
            .SingleOrDefault());

    private static readonly Func<CommunityLeadDb, int, Task<CurrentRow?>> CurrentCollection = EF.CompileAsyncQuery((CommunityLeadDb db, int kitId) =>
        db.Collections.AsNoTracking()
            .Where(c => c.KitId == kitId && c.SupersededAtUtc == null)
            .Select(c => new CurrentRow(c.Samples.OrderBy(s => s.Index).ToList(), c.Flags.OrderBy(f => f.Id).ToList()))
            .SingleOrDefault());

    private static readonly Func<CommunityLeadDb, string, IAsyncEnumerable<HistoryEntry>> History = EF.CompileAsyncQuery((CommunityLeadDb db, string code) =>
        db.AuditTrail.AsNoTracking()
            .Where(a => a.Subject == "kit" && a.SubjectKey == code).OrderBy(a => a.Id)
            .Select(a => new HistoryEntry(a.AtUtc, a.ActorLabel, a.ActorRole, a.Action, a.FromState, a.ToState, a.Reason, a.Detail)));

    public static async Task<KitResponse?> ReadAsync(CommunityLeadDb db, string code, Actor viewer, CancellationToken ct)
    {
        // One connection for the view's queries: each open of a pooled SQLite connection takes the pool's lock and
        // registers EF Core's functions again. The context closes it when the request's scope ends.
        await db.Database.OpenConnectionAsync(ct);
        var kit = await KitByCode(db, code);
        if (kit is null) return null;

        var current = await CurrentCollection(db, kit.Id);
        var samples = current?.Samples ?? [];
        var samplesByIndex = samples.ToDictionary(s => s.Index);
        var flags = (current?.Flags ?? []).Select(f =>
        {
            var sample = f.SampleIndex is { } i && samplesByIndex.TryGetValue(i, out var s) ? s : null;
            return new FlagResponse(f.Code, f.Severity, sample?.Bottle, sample?.Position, f.Message);
        }).ToList();

        var isCoordinator = viewer.Is(Roles.Coordinator);
        List<HistoryEntry>? history = null;
        if (isCoordinator)
        {
            history = [];
            await foreach (var entry in History(db, code).WithCancellation(ct)) history.Add(entry);
        }

        return new KitResponse(
            kit.Code, kit.Kind, kit.State, isCoordinator ? kit.HouseholdId : null, kit.IssuedAtUtc, kit.ReceivedAt,
            isCoordinator ? kit.StateReason : null, isCoordinator ? kit.ReplacesCode : null, isCoordinator ? kit.ReplacedByCode : null,
            samples.Select(s => new SampleResponse(s.Bottle, s.Position, s.Location, s.VolumeMl, s.CollectedAt,
                s.WaterLastUsedAt, s.FlushSeconds, s.Tap, s.StandingMinutes, isCoordinator ? s.TapNote : null)).ToList(),
            flags, KitLifecycle.AllowedActions(kit.State), history);
    }
}
