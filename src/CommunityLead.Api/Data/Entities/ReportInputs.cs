namespace CommunityLead.Api.Data.Entities;

/// <summary>
/// One row whose Version the database's own triggers raise whenever anything a health report counts changes
/// (households, kits, results, batches, letters), whichever code path or instance wrote it. The protected table set
/// is decided once per version (ReportRelease), not once per request.
/// </summary>
public class ReportInputs
{
    public const int SingleRow = 1;
    public int Id { get; set; }
    public long Version { get; set; }
}
