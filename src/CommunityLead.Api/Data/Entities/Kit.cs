using CommunityLead.Rules.Interpretation;
using CommunityLead.Rules.Kits;

namespace CommunityLead.Api.Data.Entities;

public class Kit
{
    public int Id { get; set; }
    public required string Code { get; set; }
    public KitKind Kind { get; set; }
    public KitState State { get; set; }
    public Guid HouseholdId { get; set; }
    public Household? Household { get; set; }
    public DateTime IssuedAtUtc { get; set; }
    public DateTime UpdatedAtUtc { get; set; }
    public DateTimeOffset? ReceivedAt { get; set; }
    /// <summary>Why the kit was cancelled, lost or rejected.</summary>
    public string? StateReason { get; set; }
    public string? ReplacesCode { get; set; }
    public string? ReplacedByCode { get; set; }
    /// <summary>When the first bottle of the current collection was taken (UTC): the report period's date.</summary>
    public DateTime? CollectedAtUtc { get; set; }
    /// <summary>
    /// The UTC month as yyyymm (collection month, else issue month), kept by the DbContext on every save for queries
    /// by hand and the benchmarks' baseline. The health reports do not use it: they take months on the program's own
    /// calendar (Program:TimeZone, ReportKits), which a stored UTC month would get wrong near midnight.
    /// </summary>
    public int PeriodMonth { get; set; }
    /// <summary>The current interpretation's bands, kept here so reports count in one GROUP BY.</summary>
    public Band? Band { get; set; }
    public Band? LeadBand { get; set; }
    public Band? CopperBand { get; set; }
    /// <summary>
    /// SHA-256 of the secret printed on the kit's letters (ResultSecrets), set when a letter is issued while the
    /// household result page is on; null until then, and a lookup for the kit then matches nothing.
    /// </summary>
    public string? ResultSecretHash { get; set; }
    /// <summary>Bumped on every change so two people moving the same kit at once can't both win.</summary>
    public int Version { get; set; }
    public List<Collection> Collections { get; set; } = [];
}
