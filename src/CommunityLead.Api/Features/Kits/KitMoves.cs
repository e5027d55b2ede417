using CommunityLead.Api.Auth;
using CommunityLead.Api.Data;
using CommunityLead.Api.Data.Entities;
using CommunityLead.Api.Infrastructure;
using CommunityLead.Rules.Kits;
using Microsoft.AspNetCore.Http.HttpResults;
using Microsoft.EntityFrameworkCore;

namespace CommunityLead.Api.Features.Kits;

/// <summary>Handlers that issue a kit or move it along its life.</summary>
public static class KitMoves
{
    public static async Task<Results<Created<KitIssued>, ValidationProblem>> Issue(
        IssueKitRequest request, CommunityLeadDb db, TimeProvider clock, HttpContext http, CancellationToken ct)
    {
        if (!await db.Households.AnyAsync(h => h.Id == request.HouseholdId, ct))
            return Problems.Field("householdId", "No household has this id. Sign the household up first.");
        var now = clock.GetUtcNow().UtcDateTime;
        var kit = await NewKitAsync(db, request.HouseholdId!.Value, request.Kind!.Value, now, Actor.From(http.User), null, ct);
        if (request.IssuedAt is { } handedOut) kit.IssuedAtUtc = handedOut.UtcDateTime;
        await db.SaveChangesAsync(ct);
        return TypedResults.Created($"/api/kits/{kit.Code}", new KitIssued(kit.Code, kit.State, kit.HouseholdId));
    }

    public static Task<Results<Ok<KitResponse>, ValidationProblem, ProblemHttpResult>> Cancel(
        string code, ReasonRequest request, CommunityLeadDb db, TimeProvider clock, HttpContext http, CancellationToken ct) =>
        MoveAsync(code, KitAction.Cancel, request.Reason, db, clock, http, ct);

    public static Task<Results<Ok<KitResponse>, ValidationProblem, ProblemHttpResult>> MarkLost(
        string code, ReasonRequest request, CommunityLeadDb db, TimeProvider clock, HttpContext http, CancellationToken ct) =>
        MoveAsync(code, KitAction.MarkLost, request.Reason, db, clock, http, ct);

    public static Task<Results<Ok<KitResponse>, ValidationProblem, ProblemHttpResult>> Reject(
        string code, ReasonRequest request, CommunityLeadDb db, TimeProvider clock, HttpContext http, CancellationToken ct) =>
        MoveAsync(code, KitAction.Reject, request.Reason, db, clock, http, ct);

    public static Task<Results<Ok<KitResponse>, ValidationProblem, ProblemHttpResult>> Close(
        string code, CommunityLeadDb db, TimeProvider clock, HttpContext http, CancellationToken ct) =>
        MoveAsync(code, KitAction.Close, null, db, clock, http, ct);

    public static async Task<Results<Ok<KitResponse>, ValidationProblem, ProblemHttpResult>> Receive(
        string code, ReceiptRequest request, CommunityLeadDb db, TimeProvider clock, HttpContext http, CancellationToken ct)
    {
        var (kit, invalid, missing) = await KitLookup.FindAsync(db, code, ct);
        if (invalid is not null) return invalid;
        if (kit is null) return missing!;
        var early = IssueDates.ReceivedBeforeIssue(kit, request.ReceivedAt!.Value);
        var detail = early is null ? request.Note : string.Join("; ", new[] { request.Note, early }.Where(d => d is not null));
        var actor = Actor.From(http.User);
        if (KitTransitions.Apply(db, kit, KitAction.Receive, actor, clock.GetUtcNow().UtcDateTime, detail: detail) is { } illegal)
            return illegal;
        kit.ReceivedAt = request.ReceivedAt;
        return await SaveAndReadAsync(db, kit.Code, actor, ct);
    }

    /// <summary>
    /// One call gives the household a new kit of the same kind. A kit still in the field is cancelled in
    /// the same step, so two live kits for one home can't both come back.
    /// </summary>
    public static async Task<Results<Created<KitIssued>, ValidationProblem, ProblemHttpResult>> Replace(
        string code, ReplacementRequest? request, CommunityLeadDb db, TimeProvider clock, HttpContext http, CancellationToken ct)
    {
        var (old, invalid, missing) = await KitLookup.FindAsync(db, code, ct);
        if (invalid is not null) return invalid;
        if (old is null) return missing!;
        if (old.ReplacedByCode is not null)
            return TypedResults.Problem(statusCode: 409, title: "This kit was already replaced.",
                detail: $"Kit {old.Code} was replaced by {old.ReplacedByCode}; replace that one if needed.",
                extensions: new Dictionary<string, object?> { ["replacedByCode"] = old.ReplacedByCode });
        var now = clock.GetUtcNow().UtcDateTime;
        var actor = Actor.From(http.User);
        var replacement = await NewKitAsync(db, old.HouseholdId, old.Kind, now, actor, old.Code, ct);
        var reason = string.IsNullOrWhiteSpace(request?.Reason) ? $"replaced by {replacement.Code}" : request.Reason.Trim();
        if (KitTransitions.Apply(db, old, KitAction.Replace, actor, now, reason, $"replacement {replacement.Code}") is { } illegal)
            return illegal;
        if (old.State == KitState.Cancelled) old.StateReason = reason;
        old.ReplacedByCode = replacement.Code;
        if (await KitTransitions.SaveAsync(db, old.Code, ct) is { } conflict) return conflict;
        return TypedResults.Created($"/api/kits/{replacement.Code}", new KitIssued(replacement.Code, replacement.State, replacement.HouseholdId));
    }

    private static async Task<Results<Ok<KitResponse>, ValidationProblem, ProblemHttpResult>> MoveAsync(
        string code, KitAction action, string? reason, CommunityLeadDb db, TimeProvider clock, HttpContext http, CancellationToken ct)
    {
        var (kit, invalid, missing) = await KitLookup.FindAsync(db, code, ct);
        if (invalid is not null) return invalid;
        if (kit is null) return missing!;
        var actor = Actor.From(http.User);
        if (KitTransitions.Apply(db, kit, action, actor, clock.GetUtcNow().UtcDateTime, reason?.Trim()) is { } illegal)
            return illegal;
        return await SaveAndReadAsync(db, kit.Code, actor, ct);
    }

    internal static async Task<Results<Ok<KitResponse>, ValidationProblem, ProblemHttpResult>> SaveAndReadAsync(
        CommunityLeadDb db, string code, Actor actor, CancellationToken ct)
    {
        if (await KitTransitions.SaveAsync(db, code, ct) is { } conflict) return conflict;
        return TypedResults.Ok((await KitReader.ReadAsync(db, code, actor, ct))!);
    }

    private static async Task<Kit> NewKitAsync(CommunityLeadDb db, Guid householdId, KitKind kind, DateTime nowUtc,
        Actor actor, string? replaces, CancellationToken ct)
    {
        string code;
        do code = KitCode.NewCode();
        while (await db.Kits.AnyAsync(k => k.Code == code, ct));
        var kit = new Kit
        {
            Code = code, Kind = kind, State = KitState.Issued, HouseholdId = householdId,
            IssuedAtUtc = nowUtc, UpdatedAtUtc = nowUtc, ReplacesCode = replaces,
        };
        db.Kits.Add(kit);
        db.AuditTrail.Add(Audit.Kit(actor, nowUtc, code, "issue", to: KebabEnum.Name(KitState.Issued),
            detail: replaces is null ? $"kind {KebabEnum.Name(kind)}" : $"kind {KebabEnum.Name(kind)}, replaces {replaces}"));
        return kit;
    }
}
