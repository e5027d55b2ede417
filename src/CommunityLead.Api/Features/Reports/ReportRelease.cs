using CommunityLead.Api.Data;
using CommunityLead.Api.Infrastructure;
using Microsoft.EntityFrameworkCore;
using Microsoft.Extensions.Options;

namespace CommunityLead.Api.Features.Reports;

/// <summary>
/// The protected table set of the store as it is now, decided once per version of the report's inputs
/// (ReportInputs.Version, raised by the database's triggers on every write to what a report counts) instead of on
/// every request. Deciding is deterministic: instances of the same release with the same settings, holding the same
/// version, hold the same decision.
/// </summary>
public sealed class ReportRelease(IOptions<ReportOptions> options, ProgramCalendar calendar, IHostApplicationLifetime lifetime)
{
    private readonly SemaphoreSlim deciding = new(1, 1);
    // The last set decided with no write while its kits were read: the one kept for look-ups.
    private volatile Decided? current;
    // The last set decided at all, with the version read before its kits were: a request that found an older version
    // than that asked before the decision began, so that set is no older than its question, whatever came after.
    private volatile Decided? latest;

    private sealed record Decided(long Version, Dictionary<ReportKitKind, KindTable> Tables);

    /// <summary>The version of the report inputs the kept set was decided on (null before the first decision).</summary>
    public long? DecidedVersion => current?.Version;

    public async Task<Dictionary<ReportKitKind, KindTable>> TablesAsync(CommunityLeadDb db, CancellationToken ct)
    {
        var asked = await VersionAsync(db, ct);
        if (Of(current, asked) is { } hit) return hit;
        // One decision at a time: requests arriving while the set is decided wait for it rather than each reading
        // every kit again.
        await deciding.WaitAsync(ct);
        try
        {
            if (Of(current, asked) is { } kept) return kept;
            if (Of(latest, asked, orNewer: true) is { } newer) return newer;
            // The work is shared by everyone waiting, so no single request's hanging up may cancel it; only stopping does.
            var stopping = lifetime.ApplicationStopping;
            // Nobody can be given the sets held now (each is older than this question, or it would have been returned),
            // so they go before the kits are read rather than after: a million kits' set is hundreds of megabytes.
            (current, latest) = (null, null);
            var before = await VersionAsync(db, stopping);
            var tables = SummaryTables.Protect(await ReportKits.LoadAsync(db, calendar, stopping), options.Value);
            var decided = new Decided(before, tables);
            latest = decided;
            // Kept only if nothing was written while the kits were read: then what was read is exactly that version.
            if (await VersionAsync(db, stopping) == before) current = decided;
            return tables;
        }
        finally
        {
            deciding.Release();
        }
    }

    // Not a pattern in the async method: its variables live as long as the method does, so a set that did not match
    // would be held through the whole decision of its successor.
    private static Dictionary<ReportKitKind, KindTable>? Of(Decided? decided, long version, bool orNewer = false) =>
        decided is not null && (decided.Version == version || orNewer && decided.Version > version) ? decided.Tables : null;

    private static Task<long> VersionAsync(CommunityLeadDb db, CancellationToken ct) =>
        db.ReportInputs.AsNoTracking().Select(r => r.Version).SingleAsync(ct);
}
