using CommunityLead.Api.Auth;
using CommunityLead.Api.Data;
using CommunityLead.Api.Infrastructure;
using CommunityLead.Rules.Kits;
using Microsoft.AspNetCore.Http.HttpResults;
using Microsoft.EntityFrameworkCore;

namespace CommunityLead.Api.Features.Kits;

public static class KitQueries
{
    public const int DefaultPageSize = 50;

    public static async Task<Results<Ok<KitResponse>, ValidationProblem, ProblemHttpResult>> Get(
        string code, CommunityLeadDb db, HttpContext http, CancellationToken ct)
    {
        if (KitLookup.Check(code, out var canonical) is { } invalid) return invalid;
        var kit = await KitReader.ReadAsync(db, canonical, Actor.From(http.User), ct);
        return kit is null ? Problems.KitNotFound(canonical) : TypedResults.Ok(kit);
    }

    /// <summary>The coordinator's work queue: oldest change first, so nothing waits forever at the bottom.</summary>
    public static async Task<Results<Ok<KitPage>, ValidationProblem>> List(
        CommunityLeadDb db, CancellationToken ct, string? state = null, Guid? householdId = null, int page = 1, int pageSize = DefaultPageSize)
    {
        var query = db.Kits.AsNoTracking();
        if (state is not null)
        {
            if (!KebabEnum.TryParse<KitState>(state, out var wanted))
                return Problems.Field("state", $"Use one of: {KebabEnum.Allowed<KitState>()}.");
            query = query.Where(k => k.State == wanted);
        }
        if (householdId is not null) query = query.Where(k => k.HouseholdId == householdId);
        if (Paging.Check(page, pageSize, largest: 200) is { } badPage) return badPage;

        var total = await query.CountAsync(ct);
        var items = await query.OrderBy(k => k.UpdatedAtUtc).ThenBy(k => k.Id)
            .Skip((page - 1) * pageSize).Take(pageSize)
            .Select(k => new KitSummary(k.Code, k.Kind, k.State, k.HouseholdId, k.Household!.AreaCode, k.IssuedAtUtc, k.UpdatedAtUtc,
                k.Collections.Where(c => c.SupersededAtUtc == null).SelectMany(c => c.Flags).Count()))
            .ToListAsync(ct);
        return TypedResults.Ok(new KitPage(items, page, pageSize, total));
    }
}
