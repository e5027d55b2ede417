using CommunityLead.Api.Data;
using CommunityLead.Api.Infrastructure;
using CommunityLead.Rules.Interpretation;
using Microsoft.AspNetCore.Http.HttpResults;
using Microsoft.EntityFrameworkCore;

namespace CommunityLead.Api.Features.Letters;

/// <summary>An attention item holding a letter back, as the coordinator sees it on the attention list.</summary>
public sealed record HoldingItem(int Id, AttentionFlag Reason, string Detail);

/// <summary>
/// Whether a kit's letter may go out. <see cref="Needed"/>: its current interpretation raised urgent or implausible
/// items; <see cref="Pending"/>: those still open. Once none is, who resolved the last one released the letter.
/// </summary>
public sealed record ReleaseState(bool Needed, IReadOnlyList<HoldingItem> Pending, string? ReleasedBy, DateTime? ReleasedAtUtc)
{
    public static readonly ReleaseState NotNeeded = new(false, [], null, null);

    public bool Released => Pending.Count == 0;
}

/// <summary>
/// The release gate. A letter for an urgent or implausible result reaches nobody until a coordinator has checked the
/// result (with the lab, if it looks wrong) and called the household, and said so by resolving the item with a note:
/// a household should hear such news from a person first, and a letter built on a unit mix-up must not go out. A new
/// interpretation (a lab correction, a profile change) raises new items, so it is held again.
/// </summary>
public static class LetterRelease
{
    public static async Task<IReadOnlyDictionary<int, ReleaseState>> ForAsync(CommunityLeadDb db, IReadOnlyCollection<int> kitIds,
        CancellationToken ct)
    {
        var current = await db.Interpretations.AsNoTracking().Where(i => kitIds.Contains(i.KitId) && i.SupersededAtUtc == null)
            .Select(i => (int?)i.Id).ToListAsync(ct);
        var items = await db.Attention.AsNoTracking()
            .Where(a => current.Contains(a.InterpretationId) && (a.Reason == AttentionFlag.Urgent || a.Reason == AttentionFlag.Implausible))
            .OrderBy(a => a.Priority).ThenBy(a => a.Id)
            .Select(a => new { a.Id, a.KitId, a.Reason, a.Detail, a.ResolvedAtUtc, a.ResolvedBy })
            .ToListAsync(ct);
        // A letter of this interpretation confirmed sent before the gate existed is not held back after the fact.
        var sent = (await db.Letters.AsNoTracking().Where(l => current.Contains(l.InterpretationId) && l.SentAtUtc != null)
            .Select(l => l.KitId).Distinct().ToListAsync(ct)).ToHashSet();

        var states = new Dictionary<int, ReleaseState>();
        foreach (var kit in items.GroupBy(a => a.KitId))
        {
            List<HoldingItem> pending = sent.Contains(kit.Key) ? []
                : [.. kit.Where(a => a.ResolvedAtUtc is null).Select(a => new HoldingItem(a.Id, a.Reason, a.Detail))];
            var last = pending.Count > 0 ? null : kit.Where(a => a.ResolvedAtUtc is not null).MaxBy(a => a.ResolvedAtUtc);
            states[kit.Key] = new ReleaseState(true, pending, last?.ResolvedBy, last?.ResolvedAtUtc);
        }
        return states;
    }

    public static ReleaseState Of(this IReadOnlyDictionary<int, ReleaseState> states, int kitId) =>
        states.GetValueOrDefault(kitId, ReleaseState.NotNeeded);

    /// <summary>What a coordinator must do before the letter can go out, naming each item to resolve.</summary>
    public static string WhatIsMissing(string kitCode, ReleaseState state) =>
        $"The letter for kit {kitCode} is not released yet: a coordinator must check the result and call the household, " +
        $"then resolve {string.Join(" and ", state.Pending.Select(p => $"attention item {p.Id} ({KebabEnum.Name(p.Reason)})"))} " +
        "with a note (POST /api/attention/{id}/resolve).";

    public static ProblemHttpResult NotReleased(string kitCode, ReleaseState state) =>
        TypedResults.Problem(statusCode: 409, title: "This letter is not released yet.", detail: WhatIsMissing(kitCode, state),
            extensions: new Dictionary<string, object?>
            {
                ["awaitingRelease"] = state.Pending.Select(p => new Dictionary<string, object?>
                {
                    ["id"] = p.Id, ["reason"] = KebabEnum.Name(p.Reason), ["detail"] = p.Detail,
                    ["resolve"] = $"/api/attention/{p.Id}/resolve",
                }).ToArray(),
            });
}
