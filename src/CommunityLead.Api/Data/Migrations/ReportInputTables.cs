namespace CommunityLead.Api.Data.Migrations;

/// <summary>
/// The tables a health report reads, each with triggers that raise ReportInputs.Version (both stores). A later
/// migration that makes SQLite rebuild one of them drops its triggers with the old table and must create them again;
/// ReportInputsTests fails if any of these tables stops raising the version.
/// </summary>
public static class ReportInputTables
{
    public static readonly string[] Names = ["Households", "Kits", "LabResults", "LabBatches", "Letters"];
}
