using CommunityLead.Api.Auth;
using CommunityLead.Api.Data;
using CommunityLead.Rules.Kits;
using Microsoft.EntityFrameworkCore;

namespace CommunityLead.Api.Features.Kits;

/// <summary>Builds the kit view each role may see, from no-tracking projections.</summary>
public static class KitReader
{
    public static async Task<KitResponse?> ReadAsync(CommunityLeadDb db, string code, Actor viewer, CancellationToken ct)
    {
        var kit = await db.Kits.AsNoTracking().Where(k => k.Code == code).Select(k => new
        {
            k.Id, k.Code, k.Kind, k.State, k.HouseholdId, k.IssuedAtUtc, k.ReceivedAt, k.StateReason, k.ReplacesCode, k.ReplacedByCode,
        }).SingleOrDefaultAsync(ct);
        if (kit is null) return null;

        var current = await db.Collections.AsNoTracking()
            .Where(c => c.KitId == kit.Id && c.SupersededAtUtc == null)
            .Select(c => new
            {
                Samples = c.Samples.OrderBy(s => s.Index).ToList(),
                Flags = c.Flags.OrderBy(f => f.Id).ToList(),
            })
            .SingleOrDefaultAsync(ct);
        var samples = current?.Samples ?? [];
        var samplesByIndex = samples.ToDictionary(s => s.Index);
        var flags = (current?.Flags ?? []).Select(f =>
        {
            var sample = f.SampleIndex is { } i && samplesByIndex.TryGetValue(i, out var s) ? s : null;
            return new FlagResponse(f.Code, f.Severity, sample?.Bottle, sample?.Position, f.Message);
        }).ToList();

        var isCoordinator = viewer.Is(Roles.Coordinator);
        var history = isCoordinator
            ? await db.AuditTrail.AsNoTracking()
                .Where(a => a.Subject == "kit" && a.SubjectKey == code).OrderBy(a => a.Id)
                .Select(a => new HistoryEntry(a.AtUtc, a.ActorLabel, a.ActorRole, a.Action, a.FromState, a.ToState, a.Reason, a.Detail))
                .ToListAsync(ct)
            : null;

        return new KitResponse(
            kit.Code, kit.Kind, kit.State, isCoordinator ? kit.HouseholdId : null, kit.IssuedAtUtc, kit.ReceivedAt,
            isCoordinator ? kit.StateReason : null, isCoordinator ? kit.ReplacesCode : null, isCoordinator ? kit.ReplacedByCode : null,
            samples.Select(s => new SampleResponse(s.Bottle, s.Position, s.Location, s.VolumeMl, s.CollectedAt,
                s.WaterLastUsedAt, s.FlushSeconds, s.Tap, s.StandingMinutes, isCoordinator ? s.TapNote : null)).ToList(),
            flags, KitLifecycle.AllowedActions(kit.State), history);
    }
}
