using CommunityLead.Api.Auth;
using CommunityLead.Api.Data;
using CommunityLead.Api.Infrastructure;
using CommunityLead.Rules.Interpretation;
using FluentValidation;
using Microsoft.AspNetCore.Http.HttpResults;
using Microsoft.EntityFrameworkCore;

namespace CommunityLead.Api.Features.Attention;

public sealed record AttentionEntry(int Id, string KitCode, AttentionFlag Reason, string Detail, DateTime RaisedAt);

public sealed record ResolveRequest(string? Note);

public static class AttentionEndpoints
{
    // GET  /api/attention                 kits needing a person, most urgent first     coordinator
    //                                     (one entry per reason)
    // GET  /api/attention/kits            the same, one entry per kit with all its       coordinator
    //                                     reasons and the household's name and phone
    // POST /api/attention/{id}/resolve    done, with a note (e.g. "called, filter given")  coordinator
    //                                     (for urgent and implausible items: releases the kit's letter)
    public static void MapAttention(this IEndpointRouteBuilder app)
    {
        var group = app.MapGroup("/api/attention").WithTags("Attention")
            .RequireAuthorization(Policies.Coordinator).AddEndpointFilter<ValidationFilter>()
            .ProducesProblem(StatusCodes.Status401Unauthorized).ProducesProblem(StatusCodes.Status403Forbidden);
        group.MapGet("/", List).WithName("listAttention").WithSummary("Kits needing a person, most urgent first (one item per reason)");
        group.MapGet("/kits", AttentionByKit.List).WithName("listAttentionByKit")
            .WithSummary("Kits needing a person, one row per kit with every reason, the household's name and phone");
        group.MapPost("/{id:int}/resolve", Resolve).WithName("resolveAttention")
            .WithSummary("Mark an item done, with a note (for urgent items this releases the letter)")
            .ProducesValidationProblem().ProducesProblem(StatusCodes.Status404NotFound);
    }

    /// <summary>Urgent results first, then action-level homes with a young child or pregnancy, and so on; oldest first within each.</summary>
    public static async Task<Ok<List<AttentionEntry>>> List(CommunityLeadDb db, CancellationToken ct) =>
        TypedResults.Ok(await db.Attention.AsNoTracking().Where(a => a.ResolvedAtUtc == null)
            .OrderBy(a => a.Priority).ThenBy(a => a.RaisedAtUtc).ThenBy(a => a.Id)
            .Select(a => new AttentionEntry(a.Id, a.KitCode, a.Reason, a.Detail, a.RaisedAtUtc))
            .ToListAsync(ct));

    public static async Task<Results<NoContent, ProblemHttpResult>> Resolve(
        int id, ResolveRequest request, CommunityLeadDb db, TimeProvider clock, HttpContext http, CancellationToken ct)
    {
        var item = await db.Attention.SingleOrDefaultAsync(a => a.Id == id, ct);
        if (item is null) return TypedResults.Problem(statusCode: 404, title: "No such attention item.");
        if (item.ResolvedAtUtc is not null)
            return TypedResults.Problem(statusCode: 409, title: "Already resolved.",
                detail: $"Resolved by {item.ResolvedBy}: {item.ResolutionNote}");
        AttentionResolving.Resolve(db, item, Actor.From(http.User), clock.GetUtcNow().UtcDateTime, request.Note!);
        try
        {
            await db.SaveChangesAsync(ct);
        }
        catch (DbUpdateConcurrencyException)
        {
            return TypedResults.Problem(statusCode: 409, title: "Already resolved.", detail: "Someone resolved this item a moment ago.");
        }
        return TypedResults.NoContent();
    }
}

public sealed class ResolveValidator : AbstractValidator<ResolveRequest>
{
    public ResolveValidator() =>
        RuleFor(r => r.Note).NotEmpty().WithMessage("Say what was done, in a few words.").MaximumLength(500);
}
