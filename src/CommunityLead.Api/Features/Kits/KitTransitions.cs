using CommunityLead.Api.Auth;
using CommunityLead.Api.Data;
using CommunityLead.Api.Data.Entities;
using CommunityLead.Api.Infrastructure;
using CommunityLead.Rules.Kits;
using Microsoft.AspNetCore.Http.HttpResults;
using Microsoft.EntityFrameworkCore;

namespace CommunityLead.Api.Features.Kits;

/// <summary>
/// Every state change goes through here: the lifecycle decides, the kit's version is bumped (so a
/// concurrent change loses with a 409 rather than silently), and the audit trail gets from/to and why.
/// </summary>
public static class KitTransitions
{
    public static ProblemHttpResult? Apply(CommunityLeadDb db, Kit kit, KitAction action, Actor actor, DateTime nowUtc,
        string? reason = null, string? detail = null) =>
        Apply(kit, action, actor, nowUtc, entry => db.AuditTrail.Add(entry), reason, detail);

    /// <summary>The same move for a kit the context does not track (bulk writes: <see cref="KitWrites"/>); the audit entry goes to <paramref name="record"/>.</summary>
    public static ProblemHttpResult? Apply(Kit kit, KitAction action, Actor actor, DateTime nowUtc, Action<AuditEntry> record,
        string? reason = null, string? detail = null)
    {
        if (!KitLifecycle.TryMove(kit.State, action, out var next))
            return Problems.IllegalMove(kit.Code, kit.State, action);
        var from = kit.State;
        kit.State = next;
        kit.UpdatedAtUtc = nowUtc;
        kit.Version++;
        if (reason is not null && KitLifecycle.RequiresReason(action)) kit.StateReason = reason;
        record(Audit.Kit(actor, nowUtc, kit.Code, KebabEnum.Name(action),
            KebabEnum.Name(from), KebabEnum.Name(next), reason, detail));
        return null;
    }

    /// <summary>Saves, turning a lost race on the kit's version into a 409 the client can retry.</summary>
    public static async Task<ProblemHttpResult?> SaveAsync(CommunityLeadDb db, string code, CancellationToken ct)
    {
        try
        {
            await db.SaveChangesAsync(ct);
            return null;
        }
        catch (DbUpdateConcurrencyException)
        {
            return Problems.ChangedMeanwhile(code);
        }
    }
}
