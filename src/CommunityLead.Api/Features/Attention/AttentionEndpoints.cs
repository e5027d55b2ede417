using CommunityLead.Api.Auth;
using CommunityLead.Api.Data;
using CommunityLead.Api.Data.Entities;
using CommunityLead.Api.Infrastructure;
using Microsoft.AspNetCore.Http.HttpResults;
using Microsoft.EntityFrameworkCore;

namespace CommunityLead.Api.Features.Attention;

public sealed record AttentionEntry(int Id, string KitCode, AttentionReason Reason, string Detail, DateTime RaisedAt);

public static class AttentionEndpoints
{
    // GET /api/attention     kits needing a person, oldest first      coordinator
    public static void MapAttention(this IEndpointRouteBuilder app)
    {
        var group = app.MapGroup("/api/attention").WithTags("Attention")
            .RequireAuthorization(Policies.Coordinator).AddEndpointFilter<ValidationFilter>()
            .ProducesProblem(StatusCodes.Status401Unauthorized).ProducesProblem(StatusCodes.Status403Forbidden);
        group.MapGet("/", List);
    }

    public static async Task<Ok<List<AttentionEntry>>> List(CommunityLeadDb db, CancellationToken ct) =>
        TypedResults.Ok(await db.Attention.AsNoTracking().Where(a => a.ResolvedAtUtc == null)
            .OrderBy(a => a.RaisedAtUtc).ThenBy(a => a.Id)
            .Select(a => new AttentionEntry(a.Id, a.KitCode, a.Reason, a.Detail, a.RaisedAtUtc))
            .ToListAsync(ct));
}
