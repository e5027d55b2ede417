using CommunityLead.Api.Auth;
using CommunityLead.Api.Data;
using Microsoft.AspNetCore.Http.Json;
using Microsoft.EntityFrameworkCore;
using Microsoft.Extensions.Options;

namespace CommunityLead.Api.Features.Interpretation;

/// <summary>
/// Runs right after a batch's results are saved: kits that became complete are interpreted at once, so urgent
/// results reach the attention list without anyone asking. It is a second step on purpose: the results are
/// already safe, and if this step loses a race the kits stay analyzed and can be interpreted again by POST.
/// </summary>
public sealed class InterpretAfterResults(CommunityLeadDb db, ProfileCatalog catalog, IOptions<JsonOptions> json,
    ILogger<InterpretAfterResults> log)
{
    public async Task AfterResultsAsync(IReadOnlyList<int> kitIds, Actor actor, DateTime nowUtc, CancellationToken ct)
    {
        if (kitIds.Count == 0) return;
        db.ChangeTracker.Clear();
        await KitInterpreting.InterpretAsync(db, catalog, kitIds, actor, nowUtc, json.Value.SerializerOptions, ct);
        try
        {
            await db.SaveChangesAsync(ct);
        }
        catch (DbUpdateConcurrencyException)
        {
            log.LogWarning("Interpretation of {Count} kits lost a race; they stay analyzed for a later interpretation.", kitIds.Count);
        }
    }
}
