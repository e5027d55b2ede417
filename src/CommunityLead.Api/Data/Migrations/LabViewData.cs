namespace CommunityLead.Api.Data.Migrations;

/// <summary>
/// The data half of the LabViewAndAreas migration, the same SQL on SQLite and PostgreSQL: free-text taps become
/// the closed list (a known word maps to its tap; anything else moves to the coordinator's note and the tap becomes
/// "other"), and every area code households already use becomes an active area named as its code.
/// </summary>
internal static class LabViewData
{
    // Words coordinators typed for the listed taps (common practice; Spanish as our program staff write it).
    private static readonly (string Tap, string[] Words)[] Known =
    [
        ("Kitchen", ["kitchen", "kitchen sink", "kitchen tap", "kitchen faucet", "cocina"]),
        ("Bathroom", ["bathroom", "bathroom sink", "bathroom tap", "bathroom faucet", "bath", "baño", "bano"]),
        ("Laundry", ["laundry", "laundry room", "laundry sink", "lavandería", "lavanderia"]),
        ("Other", ["other"]),
    ];

    private static string KnownList => string.Join(", ", Known.SelectMany(k => k.Words).Select(w => $"'{w}'"));

    public static readonly string[] TapsUp =
    [
        """UPDATE "Samples" SET "Tap" = NULL WHERE trim("Tap") = '';""",
        $"""UPDATE "Samples" SET "TapNote" = trim("Tap"), "Tap" = 'Other' WHERE "Tap" IS NOT NULL AND lower(trim("Tap")) NOT IN ({KnownList});""",
        .. Known.Select(k => $"""UPDATE "Samples" SET "Tap" = '{k.Tap}' WHERE lower(trim("Tap")) IN ({string.Join(", ", k.Words.Select(w => $"'{w}'"))});"""),
    ];

    /// <summary>Back to free text: the note where there is one (cut to the column), else the tap's own word.</summary>
    public const string TapsDown = """UPDATE "Samples" SET "Tap" = COALESCE(substr("TapNote", 1, 40), lower("Tap"));""";

    public const string AreasUp =
        """INSERT INTO "Areas" ("Code", "Name", "Active") SELECT DISTINCT "AreaCode", "AreaCode", TRUE FROM "Households";""";
}
