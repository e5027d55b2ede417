using CommunityLead.Api.Auth;
using CommunityLead.Api.Data;
using CommunityLead.Api.Data.Entities;
using CommunityLead.Api.Infrastructure;

namespace CommunityLead.Api.Features.Attention;

/// <summary>
/// Closes an attention item with what was done, and audits it. Resolving the urgent and implausible items of a
/// kit's current interpretation is also what releases its letter (LetterRelease), so this is the one way to do it.
/// </summary>
public static class AttentionResolving
{
    /// <summary>Tracks the change; the caller saves (and answers a lost race: the resolved time is a concurrency token).</summary>
    public static void Resolve(CommunityLeadDb db, AttentionItem item, Actor actor, DateTime nowUtc, string note)
    {
        item.ResolvedAtUtc = nowUtc;
        item.ResolvedBy = actor.Label;
        item.ResolutionNote = note.Trim();
        db.AuditTrail.Add(Audit.Kit(actor, nowUtc, item.KitCode, "resolve-attention",
            reason: item.ResolutionNote, detail: KebabEnum.Name(item.Reason)));
    }
}
