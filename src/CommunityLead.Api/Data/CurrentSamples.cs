using CommunityLead.Api.Data.Entities;
using Microsoft.EntityFrameworkCore;

namespace CommunityLead.Api.Data;

/// <summary>A bottle of a kit's current collection, with the kit it belongs to.</summary>
public sealed class CurrentSample
{
    public int KitId { get; init; }
    public required Sample Sample { get; init; }
}

public static class CurrentSamplesQuery
{
    /// <summary>
    /// The bottles of the kits' current collections (superseded recordings left out). A join rather than a
    /// navigation, because SQLite cannot run the APPLY that SelectMany over collections would need.
    /// </summary>
    public static IQueryable<CurrentSample> CurrentSamples(this CommunityLeadDb db, IReadOnlyCollection<int> kitIds) =>
        db.Samples.AsNoTracking().Join(
            db.Collections.Where(c => kitIds.Contains(c.KitId) && c.SupersededAtUtc == null),
            s => s.CollectionId, c => c.Id, (s, c) => new CurrentSample { KitId = c.KitId, Sample = s });
}
