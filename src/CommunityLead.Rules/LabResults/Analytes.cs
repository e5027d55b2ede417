namespace CommunityLead.Rules.LabResults;

public enum Analyte
{
    Lead,
    Copper,
}

/// <summary>What the lab analysed; it decides which units make sense for a result.</summary>
public enum Matrix
{
    Water,
    Soil,
}

public static class Analytes
{
    /// <summary>Reads the names labs print on reports: the word or the chemical symbol.</summary>
    public static bool TryParse(string? text, out Analyte analyte)
    {
        switch (text?.Trim().ToLowerInvariant())
        {
            case "lead" or "pb":
                analyte = Analyte.Lead;
                return true;
            case "copper" or "cu":
                analyte = Analyte.Copper;
                return true;
            default:
                analyte = default;
                return false;
        }
    }

    /// <summary>
    /// The unit a result is stored in: the one its levels are written in, so comparisons need no conversion
    /// (lead action level 15/10 µg/L, copper 1.3 mg/L, soil-lead hazard 400 ppm = mg/kg; DOMAIN.md §1, §5).
    /// </summary>
    public static string NormalUnit(Analyte analyte, Matrix matrix) => (analyte, matrix) switch
    {
        (_, Matrix.Soil) => Units.MilligramsPerKilogram,
        (Analyte.Lead, Matrix.Water) => Units.MicrogramsPerLiter,
        (Analyte.Copper, Matrix.Water) => Units.MilligramsPerLiter,
        _ => throw new ArgumentOutOfRangeException(nameof(analyte), $"No unit is defined for {analyte} in {matrix}."),
    };
}
