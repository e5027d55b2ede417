using CommunityLead.Api.Data;
using CommunityLead.Rules.Households;
using CommunityLead.Rules.Interpretation;
using Microsoft.AspNetCore.Http.HttpResults;
using Microsoft.EntityFrameworkCore;

namespace CommunityLead.Api.Features.Attention;

public sealed record AttentionReason(int Id, AttentionFlag Reason, string Detail, DateTime RaisedAt);

/// <summary>One kit needing a person, with every open reason and what it takes to make the call.</summary>
public sealed record AttentionKit(
    string KitCode, Guid HouseholdId, string HouseholdName, string? Phone, LetterLanguage Language,
    AttentionFlag MostUrgent, IReadOnlyList<AttentionReason> Reasons);

/// <summary>
/// The attention list as a coordinator works it: one row per kit (a kit with an urgent result and a retest is one
/// call, not two), the kit with the most urgent reason first, then the one waiting longest.
/// </summary>
public static class AttentionByKit
{
    public static async Task<Ok<List<AttentionKit>>> List(CommunityLeadDb db, CancellationToken ct)
    {
        // Open items are a working list (tens, not thousands), so they are grouped here rather than in SQL.
        var open = await db.Attention.AsNoTracking().Where(a => a.ResolvedAtUtc == null)
            .Join(db.Kits, a => a.KitId, k => k.Id, (a, k) => new { Item = a, k.HouseholdId })
            .Join(db.Households, x => x.HouseholdId, h => h.Id, (x, h) => new
            {
                x.Item.Id, x.Item.KitCode, x.Item.Reason, x.Item.Priority, x.Item.Detail, x.Item.RaisedAtUtc,
                HouseholdId = h.Id, h.Name, h.Phone, h.Language,
            })
            .ToListAsync(ct);
        var kits = open.GroupBy(a => a.KitCode)
            .Select(g =>
            {
                var reasons = g.OrderBy(a => a.Priority).ThenBy(a => a.RaisedAtUtc).ThenBy(a => a.Id).ToList();
                var first = reasons[0];
                return (Rank: first.Priority, Since: first.RaisedAtUtc, Kit: new AttentionKit(
                    g.Key, first.HouseholdId, first.Name, first.Phone, first.Language, first.Reason,
                    reasons.Select(a => new AttentionReason(a.Id, a.Reason, a.Detail, a.RaisedAtUtc)).ToList()));
            })
            .OrderBy(k => k.Rank).ThenBy(k => k.Since).ThenBy(k => k.Kit.KitCode, StringComparer.Ordinal)
            .Select(k => k.Kit)
            .ToList();
        return TypedResults.Ok(kits);
    }
}
