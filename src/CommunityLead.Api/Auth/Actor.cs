using System.Security.Claims;

namespace CommunityLead.Api.Auth;

/// <summary>Who did something, as written to the audit trail: the key's label and its role.</summary>
public sealed record Actor(string Label, string Role)
{
    public static Actor From(ClaimsPrincipal user) =>
        new(user.FindFirstValue(ClaimTypes.Name) ?? "unknown", user.FindFirstValue(ClaimTypes.Role) ?? "unknown");

    public static readonly Actor CommandLine = new("command-line", Roles.Admin);

    public bool Is(string role) => Role == role;
}
