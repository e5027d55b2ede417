using CommunityLead.Api.Data;
using CommunityLead.Api.Infrastructure;
using Microsoft.EntityFrameworkCore;
using Microsoft.Extensions.Options;

namespace CommunityLead.Api.Features.Reports;

/// <summary>
/// The protected table set of the store as it is now, decided once per version of the report's inputs
/// (ReportInputs.Version, raised by the database's triggers on every write to what a report counts) instead of on
/// every request. Deciding is deterministic, so two instances holding the same version hold the same decision.
/// </summary>
public sealed class ReportRelease(IOptions<ReportOptions> options, ProgramCalendar calendar)
{
    private readonly SemaphoreSlim deciding = new(1, 1);
    private volatile Decided? current;

    private sealed record Decided(long Version, Dictionary<ReportKitKind, KindTable> Tables);

    /// <summary>The version of the report inputs the set held now was decided on (null before the first decision).</summary>
    public long? DecidedVersion => current?.Version;

    public async Task<Dictionary<ReportKitKind, KindTable>> TablesAsync(CommunityLeadDb db, CancellationToken ct)
    {
        var version = await VersionAsync(db, ct);
        if (current is { } hit && hit.Version == version) return hit.Tables;
        // One decision at a time: requests arriving while the store's set is decided wait for it rather than each
        // reading every kit again.
        await deciding.WaitAsync(ct);
        try
        {
            version = await VersionAsync(db, ct);
            if (current is { } decided && decided.Version == version) return decided.Tables;
            var tables = SummaryTables.Protect(await ReportKits.LoadAsync(db, calendar, ct), options.Value);
            // Kept only if nothing was written while the kits were read: then what was read is exactly that version.
            if (await VersionAsync(db, ct) == version) current = new Decided(version, tables);
            return tables;
        }
        finally
        {
            deciding.Release();
        }
    }

    private static Task<long> VersionAsync(CommunityLeadDb db, CancellationToken ct) =>
        db.ReportInputs.AsNoTracking().Select(r => r.Version).SingleAsync(ct);
}
