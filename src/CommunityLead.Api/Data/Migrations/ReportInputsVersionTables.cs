namespace CommunityLead.Api.Data.Migrations;

/// <summary>
/// The tables and columns the ReportInputsVersion migrations (one per store) put triggers on, as those migrations
/// made them: never edit. What reports read later goes in a migration of its own and in ReportInputColumns, which
/// says why the list exists.
/// </summary>
internal static class ReportInputsVersionTables
{
    public static readonly (string Table, string Columns)[] Inputs =
    [
        ("Households", "\"Id\", \"AreaCode\", \"WaterSource\", \"YearBuilt\", \"ServiceLine\", \"ChildUnder6\""),
        ("Kits", "\"Id\", \"Kind\", \"HouseholdId\", \"IssuedAtUtc\", \"CollectedAtUtc\", \"ReceivedAt\", \"Band\", \"LeadBand\", \"CopperBand\""),
        ("LabResults", "\"KitId\", \"LabBatchId\", \"Bottle\", \"Position\", \"Analyte\", \"Value\", \"Qualifier\", \"SupersededAtUtc\""),
        ("LabBatches", "\"Id\", \"Status\""),
        ("Letters", "\"KitId\", \"DaysFromCollection\""),
    ];
}
