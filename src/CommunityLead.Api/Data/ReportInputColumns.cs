namespace CommunityLead.Api.Data;

/// <summary>
/// Every column a health report reads (ReportKits), by table. The ReportInputsVersion migrations gave each table
/// triggers that raise ReportInputs.Version on an insert, a delete, a truncate and an update of these columns, and only
/// these: a kit's state or a letter's sent mark changes often and moves no count. ReportReleaseTests fails if a report
/// query reads a column missing here, or if updating one listed here stops raising the version (a later migration that
/// makes SQLite rebuild one of these tables drops its triggers, and must create them again).
/// </summary>
public static class ReportInputColumns
{
    public static readonly IReadOnlyDictionary<string, string[]> ByTable = new Dictionary<string, string[]>
    {
        ["Households"] = ["Id", "AreaCode", "WaterSource", "YearBuilt", "ServiceLine", "ChildUnder6"],
        ["Kits"] = ["Id", "Kind", "HouseholdId", "IssuedAtUtc", "CollectedAtUtc", "ReceivedAt", "Band", "LeadBand", "CopperBand"],
        ["LabResults"] = ["KitId", "LabBatchId", "Bottle", "Position", "Analyte", "Value", "Qualifier", "SupersededAtUtc"],
        ["LabBatches"] = ["Id", "Status"],
        ["Letters"] = ["KitId", "DaysFromCollection"],
    };
}
