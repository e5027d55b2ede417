using CommunityLead.Api.Auth;
using CommunityLead.Api.Data;
using CommunityLead.Api.Infrastructure;
using Microsoft.AspNetCore.Http.HttpResults;
using Microsoft.EntityFrameworkCore;

namespace CommunityLead.Api.Features.Admin;

public sealed record KeyListing(string Label, string Role, DateTime CreatedAt, DateTime? RevokedAt);

public sealed record AuditListing(
    long Id, DateTime At, string Actor, string Role, string Subject, string SubjectKey, string Action,
    string? From, string? To, string? Reason, string? Detail);

public sealed record AuditPage(IReadOnlyList<AuditListing> Items, long? NextAfterId);

public static class AdminEndpoints
{
    // GET /api/admin/keys                      every key's label, role and dates (never a secret)
    // GET /api/admin/audit?subject=&after=     the whole audit trail, oldest first, in pages
    public static void MapAdmin(this IEndpointRouteBuilder app)
    {
        var group = app.MapGroup("/api/admin").WithTags("Admin")
            .RequireAuthorization(Policies.Admin).AddEndpointFilter<ValidationFilter>()
            .ProducesProblem(StatusCodes.Status401Unauthorized).ProducesProblem(StatusCodes.Status403Forbidden);
        group.MapGet("/keys", ListKeys).WithName("listKeys").WithSummary("Every key's label, role and dates (never a secret)");
        group.MapGet("/audit", ReadAudit).WithName("readAudit").WithSummary("The audit trail, oldest first, in pages");
    }

    public static async Task<Ok<List<KeyListing>>> ListKeys(CommunityLeadDb db, CancellationToken ct) =>
        TypedResults.Ok(await db.ApiKeys.AsNoTracking().OrderBy(k => k.Id)
            .Select(k => new KeyListing(k.Label, k.Role, k.CreatedAtUtc, k.RevokedAtUtc)).ToListAsync(ct));

    /// <summary>
    /// Keyset paging on the entry id: pages never shift while new entries arrive. Ids are handed out when an entry
    /// is written and become visible when its transaction commits, so with several writers (PostgreSQL, several
    /// instances) an entry can appear behind a cursor already passed; a reader following new entries re-reads a
    /// window before its cursor (README, Make a key).
    /// </summary>
    public static async Task<Results<Ok<AuditPage>, ValidationProblem>> ReadAudit(
        CommunityLeadDb db, CancellationToken ct, string? subject = null, long after = 0, int pageSize = 100)
    {
        if (Paging.Check(page: 1, pageSize, largest: 500) is { } badPage) return badPage;
        var query = db.AuditTrail.AsNoTracking().Where(a => a.Id > after);
        if (subject is not null) query = query.Where(a => a.Subject == subject);
        var items = await query.OrderBy(a => a.Id).Take(pageSize)
            // Admin sees no personal data: household ids are withheld, and reasons (free text that may name people) too.
            .Select(a => new AuditListing(a.Id, a.AtUtc, a.ActorLabel, a.ActorRole, a.Subject,
                a.Subject == "household" ? "(withheld)" : a.SubjectKey, a.Action, a.FromState, a.ToState, null, a.Detail))
            .ToListAsync(ct);
        return TypedResults.Ok(new AuditPage(items, items.Count == pageSize ? items[^1].Id : null));
    }
}
