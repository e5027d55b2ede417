using CommunityLead.Api.Data;
using CommunityLead.Api.Data.Entities;
using CommunityLead.Api.Infrastructure;
using CommunityLead.Rules.Kits;
using Microsoft.AspNetCore.Http.HttpResults;
using Microsoft.EntityFrameworkCore;

namespace CommunityLead.Api.Features.Kits;

/// <summary>
/// Turns the code a person typed into a kit, or into the error they need: "mistyped" (400) when the check
/// character doesn't match, "not found" (404) only for a well-formed code nobody issued.
/// </summary>
public static class KitLookup
{
    /// <summary>Exactly one of the three is set.</summary>
    public readonly record struct Found(Kit? Kit, ValidationProblem? Invalid, ProblemHttpResult? Missing);

    public static ValidationProblem? Check(string typed, out string code)
    {
        var parsed = KitCode.Parse(typed);
        code = parsed.Code ?? typed;
        return parsed.IsValid ? null
            : Problems.Field("code", parsed.Error!, parsed.Error == KitCodeParse.MistypedMessage
                ? "This code looks mistyped (check character)."
                : "This is not a kit code.");
    }

    /// <summary>Loads the kit for changing it (tracked).</summary>
    public static async Task<Found> FindAsync(CommunityLeadDb db, string typed, CancellationToken ct)
    {
        if (Check(typed, out var code) is { } invalid) return new(null, invalid, null);
        var kit = await db.Kits.SingleOrDefaultAsync(k => k.Code == code, ct);
        return kit is null ? new(null, null, Problems.KitNotFound(code)) : new(kit, null, null);
    }
}
