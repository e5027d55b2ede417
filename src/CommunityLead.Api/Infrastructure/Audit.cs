using CommunityLead.Api.Auth;
using CommunityLead.Api.Data.Entities;

namespace CommunityLead.Api.Infrastructure;

/// <summary>Builds audit entries so every feature writes them the same way.</summary>
public static class Audit
{
    public static AuditEntry Household(Actor actor, DateTime atUtc, Guid id, string action, string? detail = null) => new()
    {
        AtUtc = atUtc, ActorLabel = actor.Label, ActorRole = actor.Role,
        Subject = "household", SubjectKey = id.ToString(), Action = action, Detail = detail,
    };

    public static AuditEntry Batch(Actor actor, DateTime atUtc, string batchId, string action, string? to, string? reason, string detail) => new()
    {
        AtUtc = atUtc, ActorLabel = actor.Label, ActorRole = actor.Role,
        Subject = "lab-batch", SubjectKey = batchId, Action = action, ToState = to, Reason = reason, Detail = detail,
    };

    public static AuditEntry Kit(Actor actor, DateTime atUtc, string code, string action,
        string? from = null, string? to = null, string? reason = null, string? detail = null) => new()
    {
        AtUtc = atUtc, ActorLabel = actor.Label, ActorRole = actor.Role,
        Subject = "kit", SubjectKey = code, Action = action, FromState = from, ToState = to, Reason = reason, Detail = detail,
    };

    public static AuditEntry Area(Actor actor, DateTime atUtc, string code, string action, string? detail = null) => new()
    {
        AtUtc = atUtc, ActorLabel = actor.Label, ActorRole = actor.Role,
        Subject = "area", SubjectKey = code, Action = action, Detail = detail,
    };
}
